import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { SiteListResponse } from '@tallus/contracts';

/** Calls of the PDF reports and the team's sites. */
@Injectable({ providedIn: 'root' })
export class ReportsApi {
  private readonly http = inject(HttpClient);

  /** The distinct sites of the team's sets, waters and rock samples. */
  sites(teamId: string): Observable<SiteListResponse> {
    return this.http.get<SiteListResponse>(`/api/teams/${encodeURIComponent(teamId)}/sites`);
  }

  /** The site report: sets, waters with charge balance, models, ABA table and plot, CO2, cautions. Empty site: every record. */
  siteReport(teamId: string, site: string): Observable<Blob> {
    return this.http.get(`/api/teams/${encodeURIComponent(teamId)}/site-report.pdf`, { params: new HttpParams().set('site', site), responseType: 'blob' });
  }

  /** The report of one reaction set: reactions with checks and budgets, net reactions, review state, cautions. */
  reactionSetReport(setId: string): Observable<Blob> {
    return this.http.get(`/api/reaction-sets/${encodeURIComponent(setId)}/report.pdf`, { responseType: 'blob' });
  }
}
