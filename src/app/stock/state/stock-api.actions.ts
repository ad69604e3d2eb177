import { createActionGroup, props } from '@ngrx/store';
import { UnitSystem } from '@shared/recipes';
import { DrawPreview, ShoppingList, StockAlerts, StockDraw, StockLot } from '@shared/stock';
import { IngredientChoice } from '../ingredient-choice';

export const StockApiActions = createActionGroup({
  source: 'Stock API',
  events: {
    'Lots Loaded Success': props<{ lots: StockLot[] }>(),
    'Lots Loaded Failure': props<{ message: string }>(),
    'Choices Loaded Success': props<{ ingredients: IngredientChoice[] }>(),
    'Units Loaded Success': props<{ unitSystem: UnitSystem }>(),
    'Lot Saved Success': props<{ lot: StockLot; message: string }>(),
    'Reorder Level Saved Success': props<{ message: string }>(),
    'Stock Change Failure': props<{ message: string }>(),
    'Shopping List Loaded Success': props<{ list: ShoppingList }>(),
    'Shopping List Loaded Failure': props<{ message: string }>(),
    'Alerts Loaded Success': props<{ alerts: StockAlerts }>(),
    'Alerts Loaded Failure': props<{ message: string }>(),
    'Draw Preview Loaded Success': props<{ preview: DrawPreview }>(),
    'Draw Preview Loaded Failure': props<{ message: string }>(),
    'Draw Made Success': props<{ draw: StockDraw }>(),
    'Draw Made Failure': props<{ message: string; preview: DrawPreview | null }>(),
  },
});
