import { z } from 'zod';
import { BATCH_LIMITS, BATCH_STATUSES } from '@shared/batches';

const L = BATCH_LIMITS;
const id = z.number('must be a number').int('must be a whole number').positive('must be positive');
const between = (range: { min: number; max: number }, unit: string) =>
  z.number('must be a number').min(range.min, `must be at least ${range.min} ${unit}`).max(range.max, `must be at most ${range.max} ${unit}`);
const calendarDate = z.iso.date('must be a date as yyyy-MM-dd');
const instant = z.iso.datetime({ offset: true, message: 'must be a date and time with its offset (ISO 8601)' });

export const createBatchSchema = z
  .object({
    name: z.string('must be text').trim().min(1, 'must not be empty').max(L.nameMaxLength, `must be at most ${L.nameMaxLength} characters`),
    recipeId: id.nullable(),
    recipeVersion: id.nullable(),
    brewerId: id.optional(),
    brewDate: calendarDate,
    plannedVolumeLitres: between(L.volumeLitres, 'L'),
    fermenterId: id.nullable(),
    notes: z.string('must be text').max(L.notesMaxLength, `must be at most ${L.notesMaxLength} characters`).optional(),
  })
  .refine((b) => (b.recipeId === null) === (b.recipeVersion === null), { path: ['recipeVersion'], message: 'must be given with the recipe, and only with it' });

export const updateBatchSchema = z.object({
  name: z.string('must be text').trim().min(1, 'must not be empty').max(L.nameMaxLength, `must be at most ${L.nameMaxLength} characters`).optional(),
  brewerId: id.optional(),
  brewDate: calendarDate.optional(),
  plannedVolumeLitres: between(L.volumeLitres, 'L').optional(),
  fermenterId: id.nullable().optional(),
  notes: z.string('must be text').max(L.notesMaxLength, `must be at most ${L.notesMaxLength} characters`).optional(),
});

export const moveBatchSchema = z.object({
  status: z.enum(BATCH_STATUSES, `must be one of ${BATCH_STATUSES.join(', ')}`),
  confirmSkip: z.boolean('must be true or false').optional(),
  at: instant.optional(),
});

export const brewDaySchema = z.object({
  preBoilLitres: between(L.volumeLitres, 'L').nullable(),
  preBoilGravity: between(L.gravity, 'SG').nullable(),
  fermenterLitres: between(L.volumeLitres, 'L').nullable(),
  originalGravity: between(L.gravity, 'SG').nullable(),
  originalGravityTemperatureC: between(L.temperatureC, '°C').nullable(),
  pitchedAt: instant.nullable(),
});

export const correctionFactorSchema = z.union([
  z.object({ factor: between(L.wortCorrectionFactor, '') }),
  z.object({ refractometerReadingId: id, hydrometerReadingId: id }),
], 'must give a factor, or a refractometer and a hydrometer reading');
