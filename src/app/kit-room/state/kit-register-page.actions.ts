import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { KitItemInput, MaintenanceEntryInput } from '@shared/kit';

export const KitRegisterPageActions = createActionGroup({
  source: 'Kit Register Page',
  events: {
    Opened: emptyProps(),
    'Item Submitted': props<{ input: KitItemInput }>(),
    'Item Changed': props<{ kitItemId: number; changes: Partial<KitItemInput> }>(),
    'Item Selected': props<{ kitItemId: number }>(),
    'Maintenance Submitted': props<{ kitItemId: number; input: MaintenanceEntryInput }>(),
  },
});
