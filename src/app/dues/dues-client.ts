import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { CreateDuesPlanRequest, DUES_PATH, DuesLedger, DuesOverview, PayDuesRequest, RecordCashPaymentRequest } from '@shared/dues';
import { Observable } from 'rxjs';

/** Typed calls to /api/dues. */
@Injectable({ providedIn: 'root' })
export class DuesClient {
  private readonly http = inject(HttpClient);

  overview(): Observable<DuesOverview> {
    return this.http.get<DuesOverview>(`${DUES_PATH}/me`);
  }

  pay(request: PayDuesRequest): Observable<DuesOverview> {
    return this.http.post<DuesOverview>(`${DUES_PATH}/payments`, request);
  }

  stopRenewal(): Observable<DuesOverview> {
    return this.http.delete<DuesOverview>(`${DUES_PATH}/me/renewal`);
  }

  ledger(): Observable<DuesLedger> {
    return this.http.get<DuesLedger>(`${DUES_PATH}/ledger`);
  }

  createPlan(request: CreateDuesPlanRequest): Observable<DuesLedger> {
    return this.http.post<DuesLedger>(`${DUES_PATH}/plans`, request);
  }

  setPlanActive(planId: number, active: boolean): Observable<DuesLedger> {
    return this.http.patch<DuesLedger>(`${DUES_PATH}/plans/${planId}`, { active });
  }

  recordCash(request: RecordCashPaymentRequest): Observable<DuesLedger> {
    return this.http.post<DuesLedger>(`${DUES_PATH}/cash-payments`, request);
  }

  refund(paymentId: number): Observable<DuesLedger> {
    return this.http.post<DuesLedger>(`${DUES_PATH}/payments/${paymentId}/refund`, null);
  }
}
