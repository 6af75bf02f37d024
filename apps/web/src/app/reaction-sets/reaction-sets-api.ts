import { HttpClient, HttpEvent, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type {
  AuditEvent,
  CreateNetReactionRequest,
  CreateReactionRequest,
  CreateReactionSetRequest,
  NetReactionWriteResponse,
  Publication,
  ReactionSetDetail,
  ReactionSetHeader,
  ReactionSetSummary,
  ReactionWriteResponse,
  ReviewState,
  ReviewStepResponse,
  Revision,
  UpdateNetReactionRequest,
  UpdateReactionRequest,
  UpdateReactionSetRequest,
} from '@tallus/contracts';

/** Calls of reaction sets, their reactions and net reactions, review, revisions, publishing, import and export. */
@Injectable({ providedIn: 'root' })
export class ReactionSetsApi {
  private readonly http = inject(HttpClient);

  /** The team's reaction sets, most recently changed first; optionally only those in one review state. */
  listSets(teamId: string, state?: ReviewState): Observable<ReactionSetSummary[]> {
    const params = state ? new HttpParams().set('state', state) : undefined;
    return this.http.get<ReactionSetSummary[]>(`${teamUrl(teamId)}/reaction-sets`, { params });
  }

  /** Creates an empty draft set (editor+). */
  createSet(teamId: string, body: CreateReactionSetRequest): Observable<ReactionSetDetail> {
    return this.http.post<ReactionSetDetail>(`${teamUrl(teamId)}/reaction-sets`, body);
  }

  /** One set with its reactions, net reactions, review history and revisions. */
  getSet(setId: string): Observable<ReactionSetDetail> {
    return this.http.get<ReactionSetDetail>(setUrl(setId));
  }

  /** Renames a set or changes its site or description (409 VERSION_CONFLICT when stale). */
  updateSet(setId: string, body: UpdateReactionSetRequest): Observable<ReactionSetHeader> {
    return this.http.patch<ReactionSetHeader>(setUrl(setId), body);
  }

  /** Adds a reaction; the server checks it with libs/chem and stores the result. */
  createReaction(setId: string, body: CreateReactionRequest): Observable<ReactionWriteResponse> {
    return this.http.post<ReactionWriteResponse>(`${setUrl(setId)}/reactions`, body);
  }

  /** Saves changes to a reaction (409 VERSION_CONFLICT when someone saved it since `version`). */
  updateReaction(reactionId: string, body: UpdateReactionRequest): Observable<ReactionWriteResponse> {
    return this.http.patch<ReactionWriteResponse>(`/api/reactions/${encodeURIComponent(reactionId)}`, body);
  }

  /** Deletes a reaction. */
  deleteReaction(reactionId: string, version: number): Observable<ReactionWriteResponse> {
    return this.http.delete<ReactionWriteResponse>(`/api/reactions/${encodeURIComponent(reactionId)}`, {
      params: new HttpParams().set('version', version),
    });
  }

  /** Puts the set's reactions in a new order (every id once). */
  reorder(setId: string, reactionIds: string[]): Observable<ReactionSetDetail> {
    return this.http.post<ReactionSetDetail>(`${setUrl(setId)}/reorder`, { reactionIds });
  }

  /** Saves a net reaction of reactions of the set. */
  createNetReaction(setId: string, body: CreateNetReactionRequest): Observable<NetReactionWriteResponse> {
    return this.http.post<NetReactionWriteResponse>(`${setUrl(setId)}/net-reactions`, body);
  }

  /** Changes a net reaction. */
  updateNetReaction(id: string, body: UpdateNetReactionRequest): Observable<NetReactionWriteResponse> {
    return this.http.patch<NetReactionWriteResponse>(`/api/net-reactions/${encodeURIComponent(id)}`, body);
  }

  /** Deletes a net reaction. */
  deleteNetReaction(id: string, version: number): Observable<NetReactionWriteResponse> {
    return this.http.delete<NetReactionWriteResponse>(`/api/net-reactions/${encodeURIComponent(id)}`, {
      params: new HttpParams().set('version', version),
    });
  }

  /**
   * One review step: `submit` (editor+), `approve` or `return` (reviewer+, not the submitter).
   * A return needs a comment.
   */
  review(setId: string, step: 'submit' | 'approve' | 'return', body: { comment?: string; version?: number }): Observable<ReviewStepResponse> {
    return this.http.post<ReviewStepResponse>(`${setUrl(setId)}/${step}`, body);
  }

  /** A vetted revision, frozen. */
  getRevision(setId: string, revision: number): Observable<Revision> {
    return this.http.get<Revision>(`${setUrl(setId)}/revisions/${revision}`);
  }

  /** Publishes the latest vetted revision to the library (owners). */
  publish(setId: string): Observable<Publication> {
    return this.http.post<Publication>(`${setUrl(setId)}/publish`, {});
  }

  /** The set as a file: Tallus JSON (import reads it back) or CSV with the stored results. */
  export(setId: string, format: 'json' | 'csv'): Observable<Blob> {
    return this.http.get(`${setUrl(setId)}/export`, { params: new HttpParams().set('format', format), responseType: 'blob' });
  }

  /** Uploads a Tallus JSON file as a new draft set, reporting upload progress. */
  import(teamId: string, file: File): Observable<HttpEvent<ReactionSetDetail>> {
    const body = new FormData();
    body.append('file', file, file.name);
    return this.http.post<ReactionSetDetail>(`${teamUrl(teamId)}/reaction-sets/import`, body, {
      reportProgress: true,
      observe: 'events',
    });
  }

  /** What happened in the team lately, newest first. */
  activity(teamId: string, limit = 15): Observable<AuditEvent[]> {
    return this.http.get<AuditEvent[]>(`${teamUrl(teamId)}/activity`, { params: new HttpParams().set('limit', limit) });
  }
}

function teamUrl(teamId: string): string {
  return `/api/teams/${encodeURIComponent(teamId)}`;
}

function setUrl(setId: string): string {
  return `/api/reaction-sets/${encodeURIComponent(setId)}`;
}
