import type { UncertainValue } from '../science';

export const DISTILLATE_ANALYSES_PATH = '/api/lab/distillate-analyses';

/*
 * Routes (roles in brackets; "any" = any signed-in person):
 *   GET  /api/lab/distillate-analyses?batchId=   [any]     DistillateAnalysisResult[] (newest first)
 *   POST /api/lab/distillate-analyses            [brewer]  DistillateAnalysisRequest → DistillateAnalysisResult (201)
 */

/** What the lab measured: volumes in mL at 20 °C, the distillate's density at t, and the meter's resolution. */
export interface DistillateAnalysisRequest {
  batchId: number;
  sampleVolumeMl: number;
  madeUpVolumeMl: number;
  distillateDensity: number;
  temperatureC: number;
  densityResolution: number;
}

/** A stored analysis with its result as worked out then, and the table it read. */
export interface DistillateAnalysisResult extends DistillateAnalysisRequest {
  id: number;
  tableName: string;
  distillatePercentVolume20: number;
  beerPercentVolume20: UncertainValue;
  aboveBeerRange: boolean;
  analysedBy: string;
  analysedAt: string;
}

/** Limits of a distillate analysis, shared by the server's schema and the lab form. */
export const DISTILLATE_LIMITS = {
  volumeMl: { min: 10, max: 1000 },
  density: { min: 900, max: 1000 },
  temperature: { min: 0, max: 40 },
  densityResolution: { min: 0.001, max: 1 },
} as const;

/** The name the lab gives the built-in equation when no uploaded table is chosen. */
export const BUILTIN_TABLE_NAME = 'Built-in OIML R 22 equation';
