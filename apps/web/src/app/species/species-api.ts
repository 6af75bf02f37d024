import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, catchError, shareReplay, throwError } from 'rxjs';
import type { CreateSpeciesRequest, Species, UpdateSpeciesRequest } from '@tallus/contracts';

/** Calls of the species catalogue: the team's own species and the built-in starter catalogue. */
@Injectable({ providedIn: 'root' })
export class SpeciesApi {
  private readonly http = inject(HttpClient);
  /** The built-in catalogue once fetched (or being fetched); null before, and again after a failure. */
  private builtin: Observable<Species[]> | null = null;

  /** The team's own species, by name. */
  listTeamSpecies(teamId: string): Observable<Species[]> {
    return this.http.get<Species[]>(`/api/teams/${encodeURIComponent(teamId)}/species`);
  }

  /**
   * The built-in starter catalogue (read-only), in catalogue order. It does not change while
   * the app runs, so it is fetched once and shared; a failed fetch is forgotten, so the next
   * call tries again instead of replaying the error.
   */
  listBuiltin(): Observable<Species[]> {
    this.builtin ??= this.http.get<Species[]>('/api/species/builtin').pipe(
      catchError((error: unknown) => {
        this.builtin = null;
        return throwError(() => error);
      }),
      shareReplay(1),
    );
    return this.builtin;
  }

  /** Adds a species to the team's catalogue (editor+; 422 at `formula` with its span when it does not parse). */
  create(teamId: string, body: CreateSpeciesRequest): Observable<Species> {
    return this.http.post<Species>(`/api/teams/${encodeURIComponent(teamId)}/species`, body);
  }

  /** Changes a team species (409 VERSION_CONFLICT when stale). */
  update(speciesId: string, body: UpdateSpeciesRequest): Observable<Species> {
    return this.http.patch<Species>(`/api/species/${encodeURIComponent(speciesId)}`, body);
  }
}
