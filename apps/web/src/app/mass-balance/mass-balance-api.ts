import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { CreateMassBalanceModelInput, MassBalanceModel, UpdateMassBalanceModelRequest } from '@tallus/contracts';

/** Calls of a team's mass-balance models; the server solves on every save. */
@Injectable({ providedIn: 'root' })
export class MassBalanceApi {
  private readonly http = inject(HttpClient);

  list(teamId: string): Observable<MassBalanceModel[]> {
    return this.http.get<MassBalanceModel[]>(`/api/teams/${encodeURIComponent(teamId)}/mass-balance-models`);
  }

  get(id: string): Observable<MassBalanceModel> {
    return this.http.get<MassBalanceModel>(modelUrl(id));
  }

  create(teamId: string, body: CreateMassBalanceModelInput): Observable<MassBalanceModel> {
    return this.http.post<MassBalanceModel>(`/api/teams/${encodeURIComponent(teamId)}/mass-balance-models`, body);
  }

  update(id: string, body: UpdateMassBalanceModelRequest): Observable<MassBalanceModel> {
    return this.http.patch<MassBalanceModel>(modelUrl(id), body);
  }

  delete(id: string, version: number): Observable<void> {
    return this.http.delete<void>(modelUrl(id), { params: new HttpParams().set('version', version) });
  }

  /** Solves again with the current waters and species, and stores the result. */
  solve(id: string): Observable<MassBalanceModel> {
    return this.http.post<MassBalanceModel>(`${modelUrl(id)}/solve`, {});
  }

  /** The table of models and transfers as CSV. */
  modelsCsv(id: string): Observable<Blob> {
    return this.http.get(`${modelUrl(id)}/models.csv`, { responseType: 'blob' });
  }
}

function modelUrl(id: string): string {
  return `/api/mass-balance-models/${encodeURIComponent(id)}`;
}
