import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import {
  BREWHOUSE_PATH,
  BrewhouseSettings,
  CatalogueImportRequest,
  CatalogueImportResult,
  IngredientCatalogue,
  IngredientKind,
  IngredientUsage,
  INGREDIENTS_PATH,
  StyleTarget,
  StyleTargetInput,
  STYLES_PATH,
} from '@shared/recipes';
import { Observable } from 'rxjs';
import { CatalogueEntry, CatalogueEntryInput } from './catalogue-entry';

/** Typed calls to the ingredient catalogue, style list and brewhouse routes. */
@Injectable({ providedIn: 'root' })
export class CatalogueClient {
  private readonly http = inject(HttpClient);

  catalogue(includeRetired: boolean): Observable<IngredientCatalogue> {
    return this.http.get<IngredientCatalogue>(INGREDIENTS_PATH, { params: includeRetired ? { includeRetired: 'true' } : {} });
  }

  addEntry(kind: IngredientKind, input: CatalogueEntryInput): Observable<CatalogueEntry> {
    return this.http.post<CatalogueEntry>(`${INGREDIENTS_PATH}/${kind}`, input);
  }

  changeEntry(kind: IngredientKind, id: number, changes: Partial<CatalogueEntryInput> & { retired?: boolean }): Observable<CatalogueEntry> {
    return this.http.patch<CatalogueEntry>(`${INGREDIENTS_PATH}/${kind}/${id}`, changes);
  }

  importCsv(kind: IngredientKind, request: CatalogueImportRequest): Observable<CatalogueImportResult> {
    return this.http.post<CatalogueImportResult>(`${INGREDIENTS_PATH}/${kind}/import`, request);
  }

  usedIn(kind: IngredientKind, id: number): Observable<IngredientUsage> {
    return this.http.get<IngredientUsage>(`${INGREDIENTS_PATH}/${kind}/${id}/used-in`);
  }

  styles(): Observable<StyleTarget[]> {
    return this.http.get<StyleTarget[]>(STYLES_PATH);
  }

  addStyle(input: StyleTargetInput): Observable<StyleTarget> {
    return this.http.post<StyleTarget>(STYLES_PATH, input);
  }

  changeStyle(styleId: number, input: StyleTargetInput): Observable<StyleTarget> {
    return this.http.put<StyleTarget>(`${STYLES_PATH}/${styleId}`, input);
  }

  brewhouse(): Observable<BrewhouseSettings> {
    return this.http.get<BrewhouseSettings>(BREWHOUSE_PATH);
  }

  saveBrewhouse(settings: BrewhouseSettings): Observable<BrewhouseSettings> {
    return this.http.put<BrewhouseSettings>(BREWHOUSE_PATH, settings);
  }
}
