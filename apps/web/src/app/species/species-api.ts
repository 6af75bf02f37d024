import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { CreateSpeciesRequest, Species, UpdateSpeciesRequest } from '@tallus/contracts';

/** Calls of the species catalogue: the team's own species and the built-in starter catalogue. */
@Injectable({ providedIn: 'root' })
export class SpeciesApi {
  private readonly http = inject(HttpClient);

  /** The team's own species, by name. */
  listTeamSpecies(teamId: string): Observable<Species[]> {
    return this.http.get<Species[]>(`/api/teams/${encodeURIComponent(teamId)}/species`);
  }

  /** The built-in starter catalogue (read-only), in catalogue order. */
  listBuiltin(): Observable<Species[]> {
    return this.http.get<Species[]>('/api/species/builtin');
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
