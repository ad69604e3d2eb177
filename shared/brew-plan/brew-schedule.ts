/** The phases a batch passes through while it holds a fermenter, in order. */
export const PLAN_PHASES = ['brew', 'fermentation', 'conditioning', 'packaging'] as const;
export type PlanPhaseName = (typeof PLAN_PHASES)[number];

/** Whole days of each phase; the brew day and the packaging day are one day each. */
export interface BrewSchedule {
  fermentationDays: number;
  conditioningDays: number;
}

/** Where a schedule's figures came from, shown beside the proposals. */
export type ScheduleBasis = 'ale-yeast' | 'lager-yeast' | 'no-yeast' | 'brewer';

/**
 * Common-practice defaults (from memory, not a standard): an ale yeast finishes primary
 * fermentation within about two weeks and conditions about one more in the fermenter; a lager
 * yeast ferments cool for about three weeks and is then lagered about four. Brewers may set their own.
 */
export const DEFAULT_SCHEDULES: Record<'ale' | 'lager', BrewSchedule> = {
  ale: { fermentationDays: 14, conditioningDays: 7 },
  lager: { fermentationDays: 21, conditioningDays: 28 },
};

/**
 * A yeast whose recommended range tops out at 15 °C or below is treated as a lager yeast
 * (common practice: lager strains work at about 8–15 °C, ale strains at about 15–24 °C).
 */
export const LAGER_YEAST_MAX_C = 15;

/** The schedule a recipe's yeast suggests, or the ale defaults when the recipe has no yeast. */
export function scheduleForYeast(yeast: { temperatureMaxC: number } | null): { schedule: BrewSchedule; basis: ScheduleBasis } {
  if (!yeast) return { schedule: DEFAULT_SCHEDULES.ale, basis: 'no-yeast' };
  if (yeast.temperatureMaxC <= LAGER_YEAST_MAX_C) return { schedule: DEFAULT_SCHEDULES.lager, basis: 'lager-yeast' };
  return { schedule: DEFAULT_SCHEDULES.ale, basis: 'ale-yeast' };
}

/** Calendar days the batch holds its fermenter: brew day, fermentation, conditioning, packaging day. */
export function scheduleTotalDays(schedule: BrewSchedule): number {
  return 1 + schedule.fermentationDays + schedule.conditioningDays + 1;
}

/** Plain-language labels. */
export const PLAN_PHASE_LABELS: Record<PlanPhaseName, string> = {
  brew: 'Brew day',
  fermentation: 'Fermentation',
  conditioning: 'Conditioning',
  packaging: 'Packaging',
};

export const SCHEDULE_BASIS_LABELS: Record<ScheduleBasis, string> = {
  'ale-yeast': "from the recipe's ale yeast (common-practice defaults)",
  'lager-yeast': "from the recipe's lager yeast (common-practice defaults)",
  'no-yeast': 'ale defaults: the recipe names no yeast',
  brewer: "the brewer's plan",
};
