import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { Invitation, Member, Role, TeamSummary } from '@tallus/contracts';

/** Calls of `/api/teams`: teams, members and invitations. */
@Injectable({ providedIn: 'root' })
export class TeamsApi {
  private readonly http = inject(HttpClient);

  /** The teams of the signed-in user, with their role in each. */
  listTeams(): Observable<TeamSummary[]> {
    return this.http.get<TeamSummary[]>('/api/teams');
  }

  /**
   * Creates a team; its creator becomes owner.
   *
   * @param name the team's name
   */
  createTeam(name: string): Observable<TeamSummary> {
    return this.http.post<TeamSummary>('/api/teams', { name });
  }

  /** The members of one team. */
  listMembers(teamId: string): Observable<Member[]> {
    return this.http.get<Member[]>(`/api/teams/${encodeURIComponent(teamId)}/members`);
  }

  /** Gives a member another role (owners only; 409 `TEAM_LAST_OWNER` when it would leave no owner). */
  changeRole(teamId: string, userId: string, role: Role): Observable<Member> {
    return this.http.patch<Member>(this.memberUrl(teamId, userId), { role });
  }

  /** Removes a member from the team (owners only; 409 `TEAM_LAST_OWNER` for the last owner). */
  removeMember(teamId: string, userId: string): Observable<void> {
    return this.http.delete<void>(this.memberUrl(teamId, userId));
  }

  /** The team's pending invitations (owners only). */
  listInvitations(teamId: string): Observable<Invitation[]> {
    return this.http.get<Invitation[]>(`/api/teams/${encodeURIComponent(teamId)}/invitations`);
  }

  /** Invites someone by e-mail with a role; the API sends the e-mail. */
  invite(teamId: string, invitation: { email: string; role: Role }): Observable<Invitation> {
    return this.http.post<Invitation>(`/api/teams/${encodeURIComponent(teamId)}/invitations`, invitation);
  }

  private memberUrl(teamId: string, userId: string): string {
    return `/api/teams/${encodeURIComponent(teamId)}/members/${encodeURIComponent(userId)}`;
  }
}
