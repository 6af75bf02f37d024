import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { OutboxMessage } from '@tallus/contracts';

/** The development outbox: e-mail the API sent to its local fake SMTP server. */
@Injectable({ providedIn: 'root' })
export class OutboxApi {
  private readonly http = inject(HttpClient);

  /** Sent messages, newest first. 404 when the server runs in production. */
  list(): Observable<OutboxMessage[]> {
    return this.http.get<OutboxMessage[]>('/api/dev/outbox');
  }
}
