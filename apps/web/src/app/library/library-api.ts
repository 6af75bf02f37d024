import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { Publication, PublicationDetail, ReactionSetDetail } from '@tallus/contracts';

/** Calls of the library: vetted sets every team can read and copy. */
@Injectable({ providedIn: 'root' })
export class LibraryApi {
  private readonly http = inject(HttpClient);

  /** Every publication, newest first. */
  list(): Observable<Publication[]> {
    return this.http.get<Publication[]>('/api/library');
  }

  /** One publication with its frozen revision. */
  get(publicationId: string): Observable<PublicationDetail> {
    return this.http.get<PublicationDetail>(`/api/library/${encodeURIComponent(publicationId)}`);
  }

  /** Copies a publication into a team as a new draft set (editor+ in that team). */
  copy(publicationId: string, teamId: string): Observable<ReactionSetDetail> {
    return this.http.post<ReactionSetDetail>(`/api/library/${encodeURIComponent(publicationId)}/copy`, { teamId });
  }
}
