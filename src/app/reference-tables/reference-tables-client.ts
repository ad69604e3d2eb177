import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { ReferenceTableDetail, ReferenceTableList, REFERENCE_TABLES_PATH, RowCorrectionRequest } from '@shared/reference-tables';
import { Observable } from 'rxjs';

/** A table file as chosen in the upload form. */
export interface TableUpload { name: string; resolution: number; fileName: string; csv: string }

/** Typed calls to the reference-table routes. */
@Injectable({ providedIn: 'root' })
export class ReferenceTablesClient {
  private readonly http = inject(HttpClient);

  list(): Observable<ReferenceTableList> {
    return this.http.get<ReferenceTableList>(REFERENCE_TABLES_PATH);
  }

  upload(upload: TableUpload): Observable<ReferenceTableDetail> {
    const form = new FormData();
    form.append('name', upload.name);
    form.append('resolution', String(upload.resolution));
    form.append('file', new Blob([upload.csv], { type: 'text/csv' }), upload.fileName);
    return this.http.post<ReferenceTableDetail>(REFERENCE_TABLES_PATH, form);
  }

  detail(tableId: number): Observable<ReferenceTableDetail> {
    return this.http.get<ReferenceTableDetail>(`${REFERENCE_TABLES_PATH}/${tableId}`);
  }

  correct(tableId: number, rowId: number, correction: RowCorrectionRequest): Observable<ReferenceTableDetail> {
    return this.http.put<ReferenceTableDetail>(`${REFERENCE_TABLES_PATH}/${tableId}/rows/${rowId}/correction`, correction);
  }

  chooseLabTable(tableId: number | null): Observable<ReferenceTableList> {
    return this.http.put<ReferenceTableList>(`${REFERENCE_TABLES_PATH}/choice`, { tableId });
  }
}
