import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import { IngredientCatalogue, INGREDIENTS_PATH, UserPreferences } from '@shared/recipes';
import { PREFERENCES_PATH } from '@app/recipes/recipes-client';
import { AdjustLotRequest, DrawPreview, ReceiveLotRequest, ReorderLevelRequest, ShoppingList, STOCK_PATH, StockAlerts, StockDraw, StockLot, StockMovement } from '@shared/stock';

/** Typed calls to the stock routes (and the two reads the stock pages borrow: the catalogue and the person's units). */
@Injectable({ providedIn: 'root' })
export class StockClient {
  private readonly http = inject(HttpClient);

  lots(): Observable<StockLot[]> {
    return this.http.get<StockLot[]>(`${STOCK_PATH}/lots`);
  }

  receive(request: ReceiveLotRequest): Observable<StockLot> {
    return this.http.post<StockLot>(`${STOCK_PATH}/lots`, request);
  }

  adjust(lotId: number, request: AdjustLotRequest): Observable<StockLot> {
    return this.http.post<StockLot>(`${STOCK_PATH}/lots/${lotId}/adjustments`, request);
  }

  movements(lotId: number): Observable<StockMovement[]> {
    return this.http.get<StockMovement[]>(`${STOCK_PATH}/lots/${lotId}/movements`);
  }

  setReorderLevel(ingredientId: number, request: ReorderLevelRequest): Observable<void> {
    return this.http.put<void>(`${STOCK_PATH}/reorder-levels/${ingredientId}`, request);
  }

  alerts(): Observable<StockAlerts> {
    return this.http.get<StockAlerts>(`${STOCK_PATH}/alerts`);
  }

  drawPreview(batchId: number): Observable<DrawPreview> {
    return this.http.get<DrawPreview>(`${STOCK_PATH}/batches/${batchId}/draw`);
  }

  draw(batchId: number, acceptShortfall: boolean): Observable<StockDraw> {
    return this.http.post<StockDraw>(`${STOCK_PATH}/batches/${batchId}/draw`, { acceptShortfall });
  }

  shoppingList(from: string, to: string): Observable<ShoppingList> {
    return this.http.get<ShoppingList>(`${STOCK_PATH}/shopping-list`, { params: { from, to } });
  }

  catalogue(): Observable<IngredientCatalogue> {
    return this.http.get<IngredientCatalogue>(INGREDIENTS_PATH);
  }

  preferences(): Observable<UserPreferences> {
    return this.http.get<UserPreferences>(PREFERENCES_PATH);
  }
}

/** Where the browser downloads the shopping list as CSV (a plain link: the session cookie goes with it). */
export function shoppingListExportUrl(from: string, to: string): string {
  return `${STOCK_PATH}/shopping-list/export?from=${encodeURIComponent(from)}&to=${encodeURIComponent(to)}`;
}
