import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Batch, BATCHES_PATH, BatchSummary, BrewerChoice, CorrectionFactorRequest, CreateBatchRequest, FermenterChoice, MoveBatchRequest, SaveBrewDayRequest, UpdateBatchRequest } from '@shared/batches';
import { Observable } from 'rxjs';

/** Typed calls to the batch routes. */
@Injectable({ providedIn: 'root' })
export class BatchesClient {
  private readonly http = inject(HttpClient);

  list(mine: boolean): Observable<BatchSummary[]> {
    return this.http.get<BatchSummary[]>(BATCHES_PATH, { params: mine ? { mine: 'true' } : {} });
  }

  get(batchId: number): Observable<Batch> {
    return this.http.get<Batch>(`${BATCHES_PATH}/${batchId}`);
  }

  fermenters(): Observable<FermenterChoice[]> {
    return this.http.get<FermenterChoice[]>(`${BATCHES_PATH}/fermenters`);
  }

  brewers(): Observable<BrewerChoice[]> {
    return this.http.get<BrewerChoice[]>(`${BATCHES_PATH}/brewers`);
  }

  create(request: CreateBatchRequest): Observable<Batch> {
    return this.http.post<Batch>(BATCHES_PATH, request);
  }

  update(batchId: number, request: UpdateBatchRequest): Observable<Batch> {
    return this.http.patch<Batch>(`${BATCHES_PATH}/${batchId}`, request);
  }

  move(batchId: number, request: MoveBatchRequest): Observable<Batch> {
    return this.http.post<Batch>(`${BATCHES_PATH}/${batchId}/status`, request);
  }

  saveBrewDay(batchId: number, request: SaveBrewDayRequest): Observable<Batch> {
    return this.http.put<Batch>(`${BATCHES_PATH}/${batchId}/brew-day`, request);
  }

  setCorrectionFactor(batchId: number, request: CorrectionFactorRequest): Observable<Batch> {
    return this.http.post<Batch>(`${BATCHES_PATH}/${batchId}/correction-factor`, request);
  }
}
