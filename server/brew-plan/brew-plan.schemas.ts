import { z } from 'zod';
import { BATCH_LIMITS } from '@shared/batches';
import { BREW_PLAN_LIMITS } from '@shared/brew-plan';

const id = z.number('must be a number').int('must be a whole number').positive('must be positive');
const calendarDate = z.iso.date('must be a date as yyyy-MM-dd');
const days = (range: { min: number; max: number }) =>
  z.number('must be a number').int('must be whole days').min(range.min, `must be at least ${range.min} days`).max(range.max, `must be at most ${range.max} days`);
const volume = z
  .number('must be a number')
  .min(BATCH_LIMITS.volumeLitres.min, `must be at least ${BATCH_LIMITS.volumeLitres.min} L`)
  .max(BATCH_LIMITS.volumeLitres.max, `must be at most ${BATCH_LIMITS.volumeLitres.max} L`);

export const timelineQuerySchema = z.object({
  from: calendarDate.optional(),
  weeks: z.coerce
    .number('must be a number')
    .int('must be whole weeks')
    .min(BREW_PLAN_LIMITS.timelineWeeks.min, `must be at least ${BREW_PLAN_LIMITS.timelineWeeks.min}`)
    .max(BREW_PLAN_LIMITS.timelineWeeks.max, `must be at most ${BREW_PLAN_LIMITS.timelineWeeks.max}`)
    .default(8),
});

export const proposalSchema = z.strictObject({
  recipeId: id,
  recipeVersion: id,
  volumeLitres: volume,
  wantedWeek: calendarDate,
  fermentationDays: days(BREW_PLAN_LIMITS.fermentationDays).optional(),
  conditioningDays: days(BREW_PLAN_LIMITS.conditioningDays).optional(),
});

export const acceptSlotSchema = z.strictObject({
  name: z.string('must be text').trim().min(1, 'must not be empty').max(BATCH_LIMITS.nameMaxLength, `must be at most ${BATCH_LIMITS.nameMaxLength} characters`),
  recipeId: id,
  recipeVersion: id,
  volumeLitres: volume,
  kitItemId: id,
  brewDate: calendarDate,
  fermentationDays: days(BREW_PLAN_LIMITS.fermentationDays),
  conditioningDays: days(BREW_PLAN_LIMITS.conditioningDays),
  brewerId: id.optional(),
});

export const movePlannedBatchSchema = z.strictObject({ brewDate: calendarDate, kitItemId: id.optional() });
