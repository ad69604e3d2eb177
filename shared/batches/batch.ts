import type { ForecastOutlook } from '../fermentation/forecast-outlook';
import { BatchStatus } from './batch-status';

/** What the recipe version predicted, copied into the batch when it was started. */
export interface BatchPrediction {
  og: number | null;
  fg: number | null;
  abvEstimate: number | null;
  preBoilLitres: number | null;
  preBoilGravity: number | null;
  batchVolumeLitres: number;
  /** The yeast's expected apparent attenuation, %, middle of its range; null when unknown. */
  yeastAttenuationPercent: number | null;
}

/** What was measured on the brew day; a figure is null until entered. */
export interface BrewDayMeasurements {
  preBoilLitres: number | null;
  preBoilGravity: number | null;
  fermenterLitres: number | null;
  originalGravity: number | null;
  originalGravityTemperatureC: number | null;
  /** ISO instant. */
  pitchedAt: string | null;
}

/** When each status was reached (ISO instants), null for one not reached. */
export type BatchStatusDates = Record<BatchStatus, string | null>;

/** The latest reading and what follows from the log so far. */
export interface BatchProgress {
  latestSg: number | null;
  latestAt: string | null;
  readingCount: number;
  apparentAttenuationPercent: number | null;
  abvSoFar: number | null;
  finished: boolean;
  stuck: boolean;
}

/** A row of the batch list and of Today. */
export interface BatchSummary {
  id: number;
  name: string;
  status: BatchStatus;
  brewerId: number;
  brewerName: string;
  brewDate: string;
  plannedVolumeLitres: number;
  fermenterId: number | null;
  fermenterCode: string | null;
  recipeId: number | null;
  recipeVersion: number | null;
  progress: BatchProgress;
  /** Fermenting batches: the final gravity and finish day forecast from the log; null in other statuses. */
  forecast: ForecastOutlook | null;
}

/** One batch with everything its page shows. */
export interface Batch extends BatchSummary {
  recipeName: string | null;
  predicted: BatchPrediction | null;
  measured: BrewDayMeasurements;
  statusDates: BatchStatusDates;
  wortCorrectionFactor: number;
  notes: string;
  /** True when the caller may change it (its brewer, a brewer or an admin). */
  editable: boolean;
  createdAt: string;
}
