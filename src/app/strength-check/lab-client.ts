import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { ToleranceClass, ToleranceClassInput, TOLERANCE_CLASSES_PATH } from '@shared/strength-check';
import { Observable } from 'rxjs';

/** Typed calls to the lab routes: product classes and their tolerances. */
@Injectable({ providedIn: 'root' })
export class LabClient {
  private readonly http = inject(HttpClient);

  toleranceClasses(includeRetired = true): Observable<ToleranceClass[]> {
    return this.http.get<ToleranceClass[]>(TOLERANCE_CLASSES_PATH, { params: includeRetired ? { includeRetired: 'true' } : {} });
  }

  addToleranceClass(input: ToleranceClassInput): Observable<ToleranceClass> {
    return this.http.post<ToleranceClass>(TOLERANCE_CLASSES_PATH, input);
  }

  changeToleranceClass(id: number, input: ToleranceClassInput): Observable<ToleranceClass> {
    return this.http.put<ToleranceClass>(`${TOLERANCE_CLASSES_PATH}/${id}`, input);
  }
}
