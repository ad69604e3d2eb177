import { BrewSchedule, BREW_PLAN_LIMITS, ScheduleBasis, scheduleForYeast, ScheduleOverride, scheduleTotalDays } from '@shared/brew-plan';
import { RecipeVersion } from '@shared/recipes';
import { AppError } from '../errors/app-error';

/** The schedule for a batch of this version: the brewer's figures where given, else what its yeast suggests. */
export function scheduleFor(version: Pick<RecipeVersion, 'design' | 'ingredients'>, override: ScheduleOverride): { schedule: BrewSchedule; basis: ScheduleBasis } {
  const yeast = version.ingredients.yeasts.find((y) => y.id === version.design.yeastId) ?? null;
  const suggested = scheduleForYeast(yeast);
  if (override.fermentationDays === undefined && override.conditioningDays === undefined) return suggested;
  const schedule = {
    fermentationDays: override.fermentationDays ?? suggested.schedule.fermentationDays,
    conditioningDays: override.conditioningDays ?? suggested.schedule.conditioningDays,
  };
  return { schedule, basis: 'brewer' };
}

/** The whole schedule is one booking: refuses one longer than a booking may be, naming the field. */
export function assertScheduleFits(schedule: BrewSchedule): void {
  const total = scheduleTotalDays(schedule);
  if (total <= BREW_PLAN_LIMITS.maxTotalDays) return;
  throw new AppError('validation-failed', 'Please check these fields: conditioningDays.', 400, {
    conditioningDays: `makes the schedule ${total} days; a fermenter booking may last at most ${BREW_PLAN_LIMITS.maxTotalDays} days`,
  });
}
