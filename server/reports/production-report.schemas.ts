import { z } from 'zod';
import { MONTH_PATTERN, monthsBetween, PRODUCTION_REPORT_LIMITS } from '@shared/production-report';

const month = z.string('must be a month as yyyy-MM').regex(MONTH_PATTERN, 'must be a month as yyyy-MM');

/** The months a report covers; `thisMonth` (yyyy-MM in the co-op's zone) is the latest allowed. */
export function productionRangeSchema(thisMonth: string) {
  return z
    .object({ from: month, to: month })
    .refine((r) => monthsBetween(r.from, r.to) >= 1, { path: ['to'], message: 'must not be before from' })
    .refine((r) => monthsBetween(r.from, r.to) <= PRODUCTION_REPORT_LIMITS.maxMonths, { path: ['to'], message: `must be at most ${PRODUCTION_REPORT_LIMITS.maxMonths} months from from` })
    .refine((r) => r.to <= thisMonth, { path: ['to'], message: `must not be after this month (${thisMonth})` });
}
