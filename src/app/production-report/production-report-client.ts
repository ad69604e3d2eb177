import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import { PRODUCTION_REPORT_PATH, ProductionReport } from '@shared/production-report';

/** Typed calls to /api/reports. */
@Injectable({ providedIn: 'root' })
export class ProductionReportClient {
  private readonly http = inject(HttpClient);

  report(from: string, to: string): Observable<ProductionReport> {
    return this.http.get<ProductionReport>(PRODUCTION_REPORT_PATH, { params: { from, to } });
  }
}
