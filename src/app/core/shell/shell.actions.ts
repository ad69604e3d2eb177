import { createActionGroup, emptyProps } from '@ngrx/store';

export const ShellActions = createActionGroup({
  source: 'Shell',
  events: {
    'Sign Out Clicked': emptyProps(),
  },
});
