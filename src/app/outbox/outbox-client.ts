import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { OUTBOX_PATH, OutboxMessage, OutboxMessageSummary } from '@shared/mail';
import { Observable } from 'rxjs';

/** Typed calls to the admin outbox. */
@Injectable({ providedIn: 'root' })
export class OutboxClient {
  private readonly http = inject(HttpClient);

  list(): Observable<OutboxMessageSummary[]> {
    return this.http.get<OutboxMessageSummary[]>(OUTBOX_PATH);
  }

  message(id: number): Observable<OutboxMessage> {
    return this.http.get<OutboxMessage>(`${OUTBOX_PATH}/${id}`);
  }

  retry(id: number): Observable<OutboxMessageSummary> {
    return this.http.post<OutboxMessageSummary>(`${OUTBOX_PATH}/${id}/retry`, null);
  }
}
