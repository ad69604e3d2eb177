import { GravityUnit } from './gravity-reading';

/** Limits of reading fields, read by the server's schemas and the client's validators alike. */
export const READING_LIMITS = {
  rawValue: {
    sg: { min: 0.98, max: 1.2 },
    plato: { min: -3, max: 40 },
    brix: { min: 0, max: 40 },
    'kg-m3': { min: 975, max: 1200 },
  } satisfies Record<GravityUnit, { min: number; max: number }>,
  sampleTemperatureC: { min: 0, max: 40 },
  calibrationTemperatureC: { min: 10, max: 30 },
  noteMaxLength: 500,
  /** Largest page of readings one request returns (a logger's month at 5-minute intervals fits). */
  pageSizeMax: 20000,
  pageSizeDefault: 50,
  /** Readings one push request may carry. */
  pushBatchMax: 500,
  /** Largest CSV file accepted, in bytes. */
  uploadMaxBytes: 5 * 1024 * 1024,
  uploadMaxRows: 50000,
} as const;
