import { HttpClient, HttpEvent } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { BATCHES_PATH } from '@shared/batches';
import {
  GravityReading, ImportMode, IssuedPushToken, PushTokenSummary, ReadingChangesRequest, ReadingColumnMapping, ReadingImportResult, ReadingInput, ReadingPage, READINGS_PATH, readingsFromColumns, ReadingSortColumn,
} from '@shared/readings';
import { map, Observable } from 'rxjs';

/** What the readings table asks for. */
export interface ReadingPageRequest {
  offset: number;
  limit: number;
  sort: ReadingSortColumn;
  direction: 'asc' | 'desc';
}

/** A page of readings as the table shows them. */
export interface LoadedReadingPage {
  total: number;
  offset: number;
  items: GravityReading[];
}

/** Typed calls to the gravity log routes. */
@Injectable({ providedIn: 'root' })
export class ReadingsClient {
  private readonly http = inject(HttpClient);

  /** A page of the log; the server sends it column by column, the table reads one object per reading. */
  page(batchId: number, request: ReadingPageRequest): Observable<LoadedReadingPage> {
    return this.http
      .get<ReadingPage>(`${BATCHES_PATH}/${batchId}/readings`, { params: { ...request } })
      .pipe(map((page) => ({ total: page.total, offset: page.offset, items: readingsFromColumns(page.batchId, page.columns) })));
  }

  add(batchId: number, input: ReadingInput): Observable<GravityReading> {
    return this.http.post<GravityReading>(`${BATCHES_PATH}/${batchId}/readings`, input);
  }

  edit(readingId: number, changes: ReadingChangesRequest): Observable<GravityReading> {
    return this.http.patch<GravityReading>(`${READINGS_PATH}/${readingId}`, changes);
  }

  remove(readingId: number): Observable<void> {
    return this.http.delete<void>(`${READINGS_PATH}/${readingId}`);
  }

  /** Uploads a CSV, reporting upload progress as it goes; `dryRun` only checks it. */
  importFile(batchId: number, file: File, options: { mode: ImportMode; dryRun: boolean; columns: ReadingColumnMapping }): Observable<HttpEvent<ReadingImportResult>> {
    const body = new FormData();
    body.append('mode', options.mode);
    body.append('dryRun', String(options.dryRun));
    body.append('columns', JSON.stringify(options.columns));
    body.append('file', file, file.name);
    return this.http.post<ReadingImportResult>(`${BATCHES_PATH}/${batchId}/readings/import`, body, { reportProgress: true, observe: 'events' });
  }

  /** Address of the CSV export, for a plain download link. */
  exportUrl(batchId: number): string {
    return `${BATCHES_PATH}/${batchId}/readings/export`;
  }

  pushTokens(batchId: number): Observable<PushTokenSummary[]> {
    return this.http.get<PushTokenSummary[]>(`${BATCHES_PATH}/${batchId}/push-tokens`);
  }

  createPushToken(batchId: number, label: string): Observable<IssuedPushToken> {
    return this.http.post<IssuedPushToken>(`${BATCHES_PATH}/${batchId}/push-tokens`, { label });
  }

  revokePushToken(batchId: number, tokenId: number): Observable<void> {
    return this.http.delete<void>(`${BATCHES_PATH}/${batchId}/push-tokens/${tokenId}`);
  }
}
