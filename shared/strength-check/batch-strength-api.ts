import type { Instrument } from '../readings';
import type { ToleranceVerdict, UncertainValue } from '../science';
import type { BatchStrengthFigures, DeclaredStrengthVerdict, StrengthStep } from './batch-strength';

/*
 * Routes (roles in brackets; "any" = any signed-in person):
 *   GET  /api/batches/:batchId/strength                          [any]     BatchStrengthCheck (?declared=&toleranceClassId=)
 *   POST /api/batches/:batchId/strength/sign-offs                [brewer]  SignOffRequest → StrengthRecord (201)
 *   GET  /api/batches/:batchId/strength/sign-offs/:signOffId     [any]     StrengthRecord (stale worked out now)
 */
export const batchStrengthPath = (batchId: number) => `/api/batches/${batchId}/strength`;

/** A gravity the check used, where it came from and the instrument that read it. */
export interface GravityReadingUsed {
  role: 'og' | 'fg';
  source: 'brew-day' | 'reading';
  readingId: number | null;
  measuredAt: string | null;
  instrument: Instrument;
  sg: number;
  resolutionSg: number;
}

/** A lab result on the batch, for comparison with the gravity-based figures. */
export interface LabComparison { analysisId: number; analysedAt: string; percentVolume20: UncertainValue; tableName: string }

/** The strength check of a batch as the page shows it. */
export interface BatchStrengthCheck {
  batchId: number;
  batchName: string;
  /** Null when the batch lacks an OG or a reading to stand for FG. */
  figures: BatchStrengthFigures | null;
  missing: string | null;
  readingsUsed: GravityReadingUsed[];
  verdict: DeclaredStrengthVerdict | null;
  latestLab: LabComparison | null;
  signOffs: SignOffSummary[];
  caution: string;
}

export interface SignOffRequest { declaredPercentVolume: number; toleranceClassId: number }

/** A sign-off in a list: stale once the readings it used have changed. */
export interface SignOffSummary {
  id: number;
  declaredPercentVolume: number;
  verdict: ToleranceVerdict;
  signedBy: string;
  signedAt: string;
  stale: boolean;
}

/** The one-page strength record: a snapshot taken at sign-off that later edits do not rewrite. */
export interface StrengthRecord {
  id: number;
  batchId: number;
  batchName: string;
  method: string;
  readingsUsed: GravityReadingUsed[];
  steps: StrengthStep[];
  densityBased: UncertainValue;
  linearEstimate: UncertainValue;
  nonLinearEstimate: UncertainValue;
  verdict: DeclaredStrengthVerdict;
  signedBy: string;
  signedAt: string;
  caution: string;
  /** Worked out when read: the batch's readings differ from the ones signed. */
  stale: boolean;
}

/** Limits of a declared strength, shared by the server's schema and the sign-off form. */
export const DECLARED_STRENGTH_LIMITS = { min: 0, max: 20 } as const;
