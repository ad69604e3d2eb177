import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { BATCHES_PATH, BatchSummary } from '@shared/batches';
import {
  batchStrengthPath, BatchStrengthCheck, DISTILLATE_ANALYSES_PATH, DistillateAnalysisRequest, DistillateAnalysisResult, SignOffRequest, StrengthRecord,
} from '@shared/strength-check';
import { Observable } from 'rxjs';

/** Typed calls for a batch's strength check, its sign-offs and records, and lab analyses. */
@Injectable({ providedIn: 'root' })
export class BatchStrengthClient {
  private readonly http = inject(HttpClient);

  batches(): Observable<BatchSummary[]> {
    return this.http.get<BatchSummary[]>(BATCHES_PATH);
  }

  check(batchId: number, declared: { declaredPercentVolume: number; toleranceClassId: number } | null): Observable<BatchStrengthCheck> {
    const params: Record<string, string> = declared ? { declared: String(declared.declaredPercentVolume), toleranceClassId: String(declared.toleranceClassId) } : {};
    return this.http.get<BatchStrengthCheck>(batchStrengthPath(batchId), { params });
  }

  signOff(batchId: number, request: SignOffRequest): Observable<StrengthRecord> {
    return this.http.post<StrengthRecord>(`${batchStrengthPath(batchId)}/sign-offs`, request);
  }

  record(batchId: number, signOffId: number): Observable<StrengthRecord> {
    return this.http.get<StrengthRecord>(`${batchStrengthPath(batchId)}/sign-offs/${signOffId}`);
  }

  analyse(request: DistillateAnalysisRequest): Observable<DistillateAnalysisResult> {
    return this.http.post<DistillateAnalysisResult>(DISTILLATE_ANALYSES_PATH, request);
  }
}
