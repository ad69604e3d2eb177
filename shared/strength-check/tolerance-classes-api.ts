export const LAB_PATH = '/api/lab';
export const TOLERANCE_CLASSES_PATH = '/api/lab/tolerance-classes';

/*
 * Routes (roles in brackets; "any" = any signed-in person):
 *   GET  /api/lab/tolerance-classes                     [any]    ToleranceClass[] (?includeRetired=true)
 *   POST /api/lab/tolerance-classes                     [admin]  ToleranceClassInput → ToleranceClass (201)
 *   PUT  /api/lab/tolerance-classes/:toleranceClassId   [admin]  ToleranceClassInput & { retired } → ToleranceClass
 */

/** A product class and the tolerance (± % vol) a declared strength of it is held to. */
export interface ToleranceClass {
  id: number;
  name: string;
  tolerancePercentVolume: number;
  note: string;
  retired: boolean;
}

export interface ToleranceClassInput {
  name: string;
  tolerancePercentVolume: number;
  note: string;
  retired?: boolean;
}

/** Limits of a tolerance class, shared by the server's schema and the admin form. */
export const TOLERANCE_CLASS_LIMITS = { nameMax: 100, noteMax: 300, tolerance: { min: 0.05, max: 5 } } as const;
