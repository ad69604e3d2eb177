import { BatchStatus } from './batch-status';
import { BrewDayMeasurements } from './batch';

export const BATCHES_PATH = '/api/batches';

/*
 * Routes (roles in brackets; "any" = any signed-in person; "editor" = the batch's brewer, a brewer or an admin):
 *   GET    /api/batches                                 [any]  BatchSummary[] (?mine=true: the caller's, active only)
 *   POST   /api/batches                                 [any]  CreateBatchRequest → Batch (201)
 *   GET    /api/batches/fermenters                      [any]  FermenterChoice[]
 *   GET    /api/batches/brewers                         [any]  BrewerChoice[] (active members, for a batch's brewer)
 *   GET    /api/batches/:batchId                        [any]  Batch
 *   PATCH  /api/batches/:batchId                        [editor]  UpdateBatchRequest → Batch
 *   POST   /api/batches/:batchId/status                 [editor]  MoveBatchRequest → Batch (409 status-skips-steps unless confirmed)
 *   PUT    /api/batches/:batchId/brew-day               [editor]  BrewDayMeasurements → Batch
 *   POST   /api/batches/:batchId/correction-factor      [editor]  CorrectionFactorRequest → Batch (refractometer readings recomputed)
 *   GET    /api/batches/:batchId/readings               [any]  ReadingPage, column by column (?offset&limit&sort&direction)
 *   POST   /api/batches/:batchId/readings               [editor]  ReadingInput → GravityReading (201)
 *   POST   /api/batches/:batchId/readings/import        [editor]  multipart: file, mode, dryRun → ReadingImportResult
 *   GET    /api/batches/:batchId/readings/export        [any]  text/csv
 *   GET    /api/batches/:batchId/push-tokens            [editor]  PushTokenSummary[]
 *   POST   /api/batches/:batchId/push-tokens            [editor]  CreatePushTokenRequest → IssuedPushToken (201, token shown once)
 *   DELETE /api/batches/:batchId/push-tokens/:tokenId   [editor]  revokes (204)
 *   PATCH  /api/readings/:readingId                     [editor]  Partial<ReadingInput> → GravityReading
 *   DELETE /api/readings/:readingId                     [editor]  204
 *   POST   /api/readings/push                           [public, push token]  PushReadingsRequest → PushReadingsResult
 */

export interface CreateBatchRequest {
  name: string;
  recipeId: number | null;
  recipeVersion: number | null;
  /** Defaults to the caller; brewers and admins may name another member. */
  brewerId?: number;
  /** yyyy-MM-dd in the co-op's time zone. */
  brewDate: string;
  plannedVolumeLitres: number;
  fermenterId: number | null;
  notes?: string;
}

export type UpdateBatchRequest = Partial<Pick<CreateBatchRequest, 'name' | 'brewerId' | 'brewDate' | 'plannedVolumeLitres' | 'fermenterId' | 'notes'>>;

export interface MoveBatchRequest {
  status: BatchStatus;
  /** Must be true when the move skips statuses: the person has been asked. */
  confirmSkip?: boolean;
  /** When it happened (ISO instant); now when left out. */
  at?: string;
}

export type SaveBrewDayRequest = BrewDayMeasurements;

/** A factor typed in, or derived from a refractometer and a hydrometer reading of the same sample. */
export type CorrectionFactorRequest = { factor: number } | { refractometerReadingId: number; hydrometerReadingId: number };

/** A fermenter a batch may use. */
/** An active member who may be named a batch's brewer. */
export interface BrewerChoice {
  id: number;
  name: string;
}

export interface FermenterChoice {
  id: number;
  code: string;
  name: string;
  capacityLitres: number | null;
  /** The batch currently holding it (fermenting or conditioning), if any. */
  heldByBatchId: number | null;
}
