import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { CreateRockSampleInput, RockSample, RockSampleCsvImportResponse, RockSampleCsvPreview, UpdateRockSampleRequest } from '@tallus/contracts';

import { csvForm } from '../water/water-api';

/** Calls of a team's rock samples: ABA, mineralogical ABA and CO2 uptake computed by the server with the team's settings. */
@Injectable({ providedIn: 'root' })
export class RockSamplesApi {
  private readonly http = inject(HttpClient);

  list(teamId: string): Observable<RockSample[]> {
    return this.http.get<RockSample[]>(`${teamUrl(teamId)}/rock-samples`);
  }

  create(teamId: string, body: CreateRockSampleInput): Observable<RockSample> {
    return this.http.post<RockSample>(`${teamUrl(teamId)}/rock-samples`, body);
  }

  update(id: string, body: UpdateRockSampleRequest): Observable<RockSample> {
    return this.http.patch<RockSample>(`/api/rock-samples/${encodeURIComponent(id)}`, body);
  }

  delete(id: string, version: number): Observable<void> {
    return this.http.delete<void>(`/api/rock-samples/${encodeURIComponent(id)}`, { params: new HttpParams().set('version', version) });
  }

  /** Checks a CSV file; saves nothing. */
  preview(teamId: string, file: File): Observable<RockSampleCsvPreview> {
    return this.http.post<RockSampleCsvPreview>(`${teamUrl(teamId)}/rock-samples/import/preview`, csvForm(file, false));
  }

  import(teamId: string, file: File, skipInvalid: boolean): Observable<RockSampleCsvImportResponse> {
    return this.http.post<RockSampleCsvImportResponse>(`${teamUrl(teamId)}/rock-samples/import`, csvForm(file, skipInvalid));
  }

  exportCsv(teamId: string): Observable<Blob> {
    return this.http.get(`${teamUrl(teamId)}/rock-samples/export.csv`, { responseType: 'blob' });
  }

  templateCsv(teamId: string): Observable<Blob> {
    return this.http.get(`${teamUrl(teamId)}/rock-samples/template.csv`, { responseType: 'blob' });
  }
}

function teamUrl(teamId: string): string {
  return `/api/teams/${encodeURIComponent(teamId)}`;
}
