import { createActionGroup, props } from '@ngrx/store';
import { ProductionReport } from '@shared/production-report';

export const ProductionReportApiActions = createActionGroup({
  source: 'Production Report/API',
  events: {
    'Report Loaded Success': props<{ report: ProductionReport }>(),
    'Report Loaded Failure': props<{ message: string }>(),
  },
});
