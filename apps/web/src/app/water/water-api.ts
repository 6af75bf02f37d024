import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type {
  CreateWaterAnalysisInput,
  UpdateWaterAnalysisRequest,
  WaterAnalysis,
  WaterAnalysisCsvImportResponse,
  WaterAnalysisCsvPreview,
} from '@tallus/contracts';

/** Calls of a team's water analyses: list, read, write, CSV preview, import, export and template. */
@Injectable({ providedIn: 'root' })
export class WaterApi {
  private readonly http = inject(HttpClient);

  /** The team's analyses by site, date and name, each with its charge balance. */
  list(teamId: string): Observable<WaterAnalysis[]> {
    return this.http.get<WaterAnalysis[]>(`${teamUrl(teamId)}/water-analyses`);
  }

  get(id: string): Observable<WaterAnalysis> {
    return this.http.get<WaterAnalysis>(analysisUrl(id));
  }

  /** Adds an analysis (editor+; 409 WATER_ANALYSIS_DUPLICATE; 422 at `solutes.<key>.unit|value`). */
  create(teamId: string, body: CreateWaterAnalysisInput): Observable<WaterAnalysis> {
    return this.http.post<WaterAnalysis>(`${teamUrl(teamId)}/water-analyses`, body);
  }

  update(id: string, body: UpdateWaterAnalysisRequest): Observable<WaterAnalysis> {
    return this.http.patch<WaterAnalysis>(analysisUrl(id), body);
  }

  /** Deletes an analysis (409 WATER_ANALYSIS_IN_USE while a mass-balance model uses it). */
  delete(id: string, version: number): Observable<void> {
    return this.http.delete<void>(analysisUrl(id), { params: { version } });
  }

  /** Checks a CSV file; saves nothing. */
  preview(teamId: string, file: File): Observable<WaterAnalysisCsvPreview> {
    return this.http.post<WaterAnalysisCsvPreview>(`${teamUrl(teamId)}/water-analyses/import/preview`, csvForm(file, false));
  }

  /** Saves a CSV file's rows in one transaction; `skipInvalid` leaves bad rows out. */
  import(teamId: string, file: File, skipInvalid: boolean): Observable<WaterAnalysisCsvImportResponse> {
    return this.http.post<WaterAnalysisCsvImportResponse>(`${teamUrl(teamId)}/water-analyses/import`, csvForm(file, skipInvalid));
  }

  exportCsv(teamId: string): Observable<Blob> {
    return this.http.get(`${teamUrl(teamId)}/water-analyses/export.csv`, { responseType: 'blob' });
  }

  templateCsv(teamId: string): Observable<Blob> {
    return this.http.get(`${teamUrl(teamId)}/water-analyses/template.csv`, { responseType: 'blob' });
  }
}

/**
 * The multipart body of a CSV preview or import.
 *
 * @param file the chosen file
 * @param skipInvalid whether to save the valid rows and leave the invalid ones out
 */
export function csvForm(file: File, skipInvalid: boolean): FormData {
  const form = new FormData();
  form.append('file', file);
  if (skipInvalid) form.append('skipInvalid', 'true');
  return form;
}

function teamUrl(teamId: string): string {
  return `/api/teams/${encodeURIComponent(teamId)}`;
}

function analysisUrl(id: string): string {
  return `/api/water-analyses/${encodeURIComponent(id)}`;
}
