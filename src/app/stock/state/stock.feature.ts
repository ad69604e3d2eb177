import { createFeature, createReducer, on } from '@ngrx/store';
import { UnitSystem } from '@shared/recipes';
import { DrawPreview, ShoppingList, StockAlerts, StockDraw, StockLot } from '@shared/stock';
import { IngredientChoice } from '../ingredient-choice';
import { DrawDialogActions } from './draw-dialog.actions';
import { ShoppingListPageActions } from './shopping-list-page.actions';
import { StockApiActions } from './stock-api.actions';
import { StockDialogsActions } from './stock-dialogs.actions';
import { StockPageActions } from './stock-page.actions';

export interface StockState {
  lots: StockLot[] | null;
  lotsError: string | null;
  filter: string;
  ingredients: IngredientChoice[];
  unitSystem: UnitSystem;
  saving: boolean;
  shoppingList: ShoppingList | null;
  shoppingLoading: boolean;
  shoppingError: string | null;
  alerts: StockAlerts | null;
  drawPreview: DrawPreview | null;
  drawLoading: boolean;
  drawSaving: boolean;
  drawError: string | null;
  drawMade: StockDraw | null;
}

export const initialStockState: StockState = {
  lots: null,
  lotsError: null,
  filter: '',
  ingredients: [],
  unitSystem: 'metric',
  saving: false,
  shoppingList: null,
  shoppingLoading: false,
  shoppingError: null,
  alerts: null,
  drawPreview: null,
  drawLoading: false,
  drawSaving: false,
  drawError: null,
  drawMade: null,
};

const replaceLot = (lots: StockLot[] | null, lot: StockLot): StockLot[] =>
  lots?.some((each) => each.id === lot.id) ? lots.map((each) => (each.id === lot.id ? lot : each)) : [lot, ...(lots ?? [])];

export const stockFeature = createFeature({
  name: 'stock',
  reducer: createReducer(
    initialStockState,
    on(StockPageActions.opened, (state): StockState => ({ ...state, lotsError: null })),
    on(StockPageActions.filterChanged, (state, { filter }): StockState => ({ ...state, filter })),
    on(StockApiActions.lotsLoadedSuccess, (state, { lots }): StockState => ({ ...state, lots })),
    on(StockApiActions.lotsLoadedFailure, (state, { message }): StockState => ({ ...state, lotsError: message })),
    on(StockApiActions.choicesLoadedSuccess, (state, { ingredients }): StockState => ({ ...state, ingredients })),
    on(StockApiActions.unitsLoadedSuccess, (state, { unitSystem }): StockState => ({ ...state, unitSystem })),
    on(StockDialogsActions.receiveLotSubmitted, StockDialogsActions.adjustmentSubmitted, StockDialogsActions.reorderLevelSubmitted, (state): StockState => ({ ...state, saving: true })),
    on(StockApiActions.lotSavedSuccess, (state, { lot }): StockState => ({ ...state, saving: false, lots: replaceLot(state.lots, lot) })),
    on(StockApiActions.reorderLevelSavedSuccess, StockApiActions.stockChangeFailure, (state): StockState => ({ ...state, saving: false })),
    on(ShoppingListPageActions.opened, ShoppingListPageActions.horizonChanged, (state): StockState => ({ ...state, shoppingLoading: true, shoppingError: null })),
    on(StockApiActions.shoppingListLoadedSuccess, (state, { list }): StockState => ({ ...state, shoppingLoading: false, shoppingList: list })),
    on(StockApiActions.shoppingListLoadedFailure, (state, { message }): StockState => ({ ...state, shoppingLoading: false, shoppingError: message })),
    on(StockApiActions.alertsLoadedSuccess, (state, { alerts }): StockState => ({ ...state, alerts })),
    on(DrawDialogActions.drawOffered, (state): StockState => ({ ...state, drawPreview: null, drawLoading: true, drawError: null, drawMade: null })),
    on(StockApiActions.drawPreviewLoadedSuccess, (state, { preview }): StockState => ({ ...state, drawLoading: false, drawPreview: preview })),
    on(StockApiActions.drawPreviewLoadedFailure, (state, { message }): StockState => ({ ...state, drawLoading: false, drawError: message })),
    on(DrawDialogActions.drawConfirmed, (state): StockState => ({ ...state, drawSaving: true, drawError: null })),
    on(StockApiActions.drawMadeSuccess, (state, { draw }): StockState => ({ ...state, drawSaving: false, drawMade: draw })),
    on(StockApiActions.drawMadeFailure, (state, { message, preview }): StockState => ({ ...state, drawSaving: false, drawError: message, drawPreview: preview ?? state.drawPreview })),
  ),
});
