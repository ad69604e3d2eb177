import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { FermentationChartData, fermentationPath } from '@shared/fermentation';
import { Observable } from 'rxjs';

/** Typed call for a batch's fermentation chart and forecast. */
@Injectable({ providedIn: 'root' })
export class FermentationClient {
  private readonly http = inject(HttpClient);

  chart(batchId: number): Observable<FermentationChartData> {
    return this.http.get<FermentationChartData>(fermentationPath(batchId));
  }
}
