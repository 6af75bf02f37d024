import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { MineralFormula, SaveMineralFormulaInput, SaveMineralFormulaResponse } from '@tallus/contracts';

/** Calls of saved mineral formulas: the provenance of species recalculated from oxide analyses. */
@Injectable({ providedIn: 'root' })
export class MineralFormulasApi {
  private readonly http = inject(HttpClient);

  /** The team's saved recalculations, newest first. */
  list(teamId: string): Observable<MineralFormula[]> {
    return this.http.get<MineralFormula[]>(`/api/teams/${encodeURIComponent(teamId)}/mineral-formulas`);
  }

  /** Saves the formula as a species of the team (and its weathering reaction into a set, when one is named). */
  save(teamId: string, body: SaveMineralFormulaInput): Observable<SaveMineralFormulaResponse> {
    return this.http.post<SaveMineralFormulaResponse>(`/api/teams/${encodeURIComponent(teamId)}/mineral-formulas`, body);
  }

  /** Every saved recalculation as CSV. */
  exportCsv(teamId: string): Observable<Blob> {
    return this.http.get(`/api/teams/${encodeURIComponent(teamId)}/mineral-formulas/export.csv`, { responseType: 'blob' });
  }
}
