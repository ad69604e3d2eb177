import { createSelector } from '@ngrx/store';
import { hasAnyRole } from '@shared/auth';
import { StockLot } from '@shared/stock';
import { authFeature } from '@app/auth/state/auth.feature';
import { stockFeature } from './stock.feature';

/** Brewers and admins receive, adjust and draw stock; members read it. */
export const selectMayKeepStock = createSelector(authFeature.selectRoles, (roles) => hasAnyRole(roles, ['brewer', 'admin']));

/** Lots whose ingredient or supplier note contains the filter, as people type it (any case). */
export function filterLots(lots: readonly StockLot[], filter: string): StockLot[] {
  const needle = filter.trim().toLocaleLowerCase();
  if (!needle) return [...lots];
  return lots.filter((lot) => lot.ingredientName.toLocaleLowerCase().includes(needle) || lot.supplierNote.toLocaleLowerCase().includes(needle));
}

export const selectStockPageViewModel = createSelector(stockFeature.selectStockState, selectMayKeepStock, (state, mayKeep) => ({
  lots: state.lots === null ? null : filterLots(state.lots, state.filter),
  totalLots: state.lots?.length ?? 0,
  filter: state.filter,
  error: state.lotsError,
  unitSystem: state.unitSystem,
  saving: state.saving,
  mayKeep,
}));

export const selectShoppingListViewModel = createSelector(stockFeature.selectStockState, (state) => ({
  list: state.shoppingList,
  loading: state.shoppingLoading,
  error: state.shoppingError,
  unitSystem: state.unitSystem,
}));

/** Today's stock alerts, null for people who do not keep stock or before they load. */
export const selectTodayStockAlerts = createSelector(stockFeature.selectAlerts, stockFeature.selectUnitSystem, selectMayKeepStock, (alerts, unitSystem, mayKeep) =>
  mayKeep && alerts ? { alerts, unitSystem } : null,
);
