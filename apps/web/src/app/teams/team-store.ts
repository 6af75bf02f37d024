import { Injectable, computed, inject, signal } from '@angular/core';
import { Observable, of, tap } from 'rxjs';
import type { Role, TeamSummary } from '@tallus/contracts';

import { AuthStore } from '../auth/auth-store';
import { hasRoleAtLeast } from './roles';
import { TeamsApi } from './teams-api';

/** Key of the last team the user worked in, so the start page can return to it. */
const LAST_TEAM_STORAGE_KEY = 'tallus.lastTeam';

/** The user's teams and the current one (which the route `/teams/:teamId/...` chooses). */
@Injectable({ providedIn: 'root' })
export class TeamStore {
  private readonly api = inject(TeamsApi);
  private readonly authStore = inject(AuthStore);

  /** Teams as loaded, with the session they were loaded for: another session never sees them. */
  private readonly loadedState = signal<{ token: string | null; teams: TeamSummary[] } | null>(null);
  private readonly currentTeamIdState = signal<string | null>(null);

  /** The user's teams, sorted by name; null until loaded for the current session. */
  readonly teams = computed(() => {
    const loaded = this.loadedState();
    return loaded !== null && loaded.token === this.authStore.token() ? loaded.teams : null;
  });
  /** The team the user works in now, once teams are loaded. */
  readonly currentTeam = computed(
    () => this.teams()?.find((team) => team.id === this.currentTeamIdState()) ?? null,
  );
  /** Whether the user owns the current team (manages members and invitations). */
  readonly isOwner = computed(() => this.currentTeam()?.role === 'owner');
  /** Whether the user may vet or return reaction sets in the current team (reviewer or above). */
  readonly isReviewer = computed(() => this.hasCurrentRole('reviewer'));
  /** Whether the user may write in the current team (editor or above). */
  readonly canWrite = computed(() => this.hasCurrentRole('editor'));

  /** Loads the user's teams from the API. */
  load(): Observable<TeamSummary[]> {
    const token = this.authStore.token();
    return this.api.listTeams().pipe(tap((teams) => this.loadedState.set({ token, teams: sortByName(teams) })));
  }

  /** The teams, loading them only when not loaded yet. */
  ensureLoaded(): Observable<TeamSummary[]> {
    const teams = this.teams();
    return teams === null ? this.load() : of(teams);
  }

  /**
   * Creates a team, of which the user becomes owner, and adds it to the list.
   *
   * @param name the team's name
   */
  create(name: string): Observable<TeamSummary> {
    return this.api.createTeam(name).pipe(
      tap((team) =>
        this.loadedState.set({ token: this.authStore.token(), teams: sortByName([...(this.teams() ?? []), team]) }),
      ),
    );
  }

  /**
   * Makes a team the current one and remembers it for the next visit.
   *
   * @param teamId a team of `teams()`
   */
  select(teamId: string): void {
    this.currentTeamIdState.set(teamId);
    try {
      localStorage.setItem(LAST_TEAM_STORAGE_KEY, teamId);
    } catch {
      // Storage disabled: the start page then opens the first team instead.
    }
  }

  /** The team to open on the start page: the last one used, else the first. */
  preferredTeam(): TeamSummary | null {
    const teams = this.teams() ?? [];
    const lastId = readLastTeamId();
    return teams.find((team) => team.id === lastId) ?? teams[0] ?? null;
  }

  /** Whether the user's role in the current team is `required` or above; false without a team. */
  private hasCurrentRole(required: Role): boolean {
    const team = this.currentTeam();
    return team ? hasRoleAtLeast(team.role, required) : false;
  }
}

function sortByName(teams: TeamSummary[]): TeamSummary[] {
  return [...teams].sort((a, b) => a.name.localeCompare(b.name));
}

function readLastTeamId(): string | null {
  try {
    return localStorage.getItem(LAST_TEAM_STORAGE_KEY);
  } catch {
    return null;
  }
}
