/** Limits of stock, read by the server's schemas and the client's validators alike. */
export const STOCK_LIMITS = {
  /** The most one lot may hold, in its SI unit (a pallet of malt is about 1 t). */
  quantityMax: 10_000,
  supplierNoteMaxLength: 500,
  adjustmentNoteMaxLength: 500,
  /** The longest horizon a shopping list looks ahead. */
  horizonMaxDays: 366,
  horizonDefaultDays: 28,
  /** Lots whose best-before falls within this many days are flagged on Today. */
  bestBeforeWarningDays: 30,
} as const;

/** Quantities closer than this to each other are equal (a micro-gram of a kilogram-counted malt). */
export const STOCK_EPSILON = 1e-9;
