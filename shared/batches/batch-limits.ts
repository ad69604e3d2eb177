/** Limits of batch fields, read by the server's schemas and the client's validators alike. */
export const BATCH_LIMITS = {
  nameMaxLength: 100,
  notesMaxLength: 4000,
  volumeLitres: { min: 0.5, max: 2000 },
  gravity: { min: 0.98, max: 1.2 },
  temperatureC: { min: 0, max: 100 },
  wortCorrectionFactor: { min: 0.9, max: 1.2 },
} as const;
