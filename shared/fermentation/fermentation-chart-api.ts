import type { FermentationForecast, NoForecast } from './fermentation-forecast';

/*
 * Routes (roles in brackets; "any" = any signed-in person):
 *   GET /api/batches/:batchId/fermentation   [any]  FermentationChartData
 */
export const fermentationPath = (batchId: number) => `/api/batches/${batchId}/fermentation`;

/** One reading as the chart draws it: epoch ms, corrected SG and the sample's temperature. */
export interface ChartReading { at: number; sg: number; temperatureC: number | null }

/** Everything the fermentation chart of a batch shows. */
export interface FermentationChartData {
  batchId: number;
  batchName: string;
  og: number | null;
  readings: ChartReading[];
  apparentAttenuationPercent: number | null;
  abvSoFar: number | null;
  forecast: FermentationForecast | NoForecast;
}
