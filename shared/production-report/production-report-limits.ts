/** Limits of the production report, read by the server's schema and the page. */
export const PRODUCTION_REPORT_LIMITS = {
  /** Widest range one report covers, in months. */
  maxMonths: 36,
  /** The month ranges the page offers, ending with this month. */
  monthChoices: [6, 12, 24] as readonly number[],
} as const;

/** yyyy-MM with a real month. */
export const MONTH_PATTERN = /^\d{4}-(0[1-9]|1[0-2])$/;
