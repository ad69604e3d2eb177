import { createActionGroup, props } from '@ngrx/store';
import { FermentationChartData } from '@shared/fermentation';

export const FermentationApiActions = createActionGroup({
  source: 'Fermentation API',
  events: {
    'Chart Loaded Success': props<{ chart: FermentationChartData }>(),
    'Chart Loaded Failure': props<{ message: string }>(),
  },
});
