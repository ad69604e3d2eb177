import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { StockLot } from '@shared/stock';

export const StockPageActions = createActionGroup({
  source: 'Stock Page',
  events: {
    Opened: emptyProps(),
    'Filter Changed': props<{ filter: string }>(),
    'Receive Lot Clicked': emptyProps(),
    'Adjust Lot Clicked': props<{ lot: StockLot }>(),
    'Reorder Level Clicked': props<{ lot: StockLot }>(),
    'History Clicked': props<{ lot: StockLot }>(),
  },
});
