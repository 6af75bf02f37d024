import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { TeamSettings, UpdateTeamSettingsRequest } from '@tallus/contracts';

/** Calls of a team's site-data settings: charge-balance threshold and convention, NPR bands, AP sulfur, carbonate pathway. */
@Injectable({ providedIn: 'root' })
export class TeamSettingsApi {
  private readonly http = inject(HttpClient);

  /** The team's settings with the defaults and their published sources (any member). */
  get(teamId: string): Observable<TeamSettings> {
    return this.http.get<TeamSettings>(`/api/teams/${encodeURIComponent(teamId)}/settings`);
  }

  /** Changes settings (owner; 409 VERSION_CONFLICT when stale). */
  update(teamId: string, body: UpdateTeamSettingsRequest): Observable<TeamSettings> {
    return this.http.patch<TeamSettings>(`/api/teams/${encodeURIComponent(teamId)}/settings`, body);
  }
}
