import { createActionGroup, props } from '@ngrx/store';
import { AdjustLotRequest, ReceiveLotRequest, ReorderLevelRequest } from '@shared/stock';

export const StockDialogsActions = createActionGroup({
  source: 'Stock Dialogs',
  events: {
    'Receive Lot Submitted': props<{ request: ReceiveLotRequest }>(),
    'Adjustment Submitted': props<{ lotId: number; request: AdjustLotRequest }>(),
    'Reorder Level Submitted': props<{ ingredientId: number; request: ReorderLevelRequest }>(),
  },
});
