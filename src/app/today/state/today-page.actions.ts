import { createActionGroup, emptyProps } from '@ngrx/store';

export const TodayPageActions = createActionGroup({
  source: 'Today Page',
  events: {
    Opened: emptyProps(),
  },
});
