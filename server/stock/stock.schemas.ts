import { z } from 'zod';
import { ADJUSTMENT_REASONS, STOCK_LIMITS, STOCK_UNITS } from '@shared/stock';

const calendarDate = z.iso.date('must be a date as yyyy-MM-dd');
const quantity = z.number('must be a number').positive('must be above zero').max(STOCK_LIMITS.quantityMax, `must be at most ${STOCK_LIMITS.quantityMax}`);
const unit = z.enum(STOCK_UNITS, `must be one of ${STOCK_UNITS.join(', ')}`);
const note = z.string('must be text').trim().max(STOCK_LIMITS.adjustmentNoteMaxLength, `must be at most ${STOCK_LIMITS.adjustmentNoteMaxLength} characters`);

export const receiveLotSchema = z
  .strictObject({
    ingredientId: z.number('must be a number').int('must be a whole number').positive('must be an ingredient id'),
    unit,
    quantity,
    receivedOn: calendarDate,
    bestBefore: calendarDate.nullable(),
    supplierNote: z.string('must be text').trim().max(STOCK_LIMITS.supplierNoteMaxLength, `must be at most ${STOCK_LIMITS.supplierNoteMaxLength} characters`).default(''),
  })
  .refine((lot) => lot.bestBefore === null || lot.bestBefore >= lot.receivedOn, { path: ['bestBefore'], message: 'must not be before the day it was received' });

const signedChange = z
  .number('must be a number')
  .refine((n) => n !== 0, 'must not be zero')
  .refine((n) => Math.abs(n) <= STOCK_LIMITS.quantityMax, `must be at most ${STOCK_LIMITS.quantityMax} either way`);

export const adjustLotSchema = z.discriminatedUnion(
  'reason',
  [
    z.strictObject({ reason: z.literal('count'), countedQuantity: z.number('must be a number').min(0, 'must not be below zero').max(STOCK_LIMITS.quantityMax), note: note.default('') }),
    z.strictObject({ reason: z.literal(['spillage', 'spoilage']), change: signedChange, note: note.default('') }),
    z.strictObject({ reason: z.literal('other'), change: signedChange, note: note.min(1, 'must say what happened') }),
  ],
  { error: `must be one of ${ADJUSTMENT_REASONS.join(', ')}` },
);

export const reorderLevelSchema = z.strictObject({
  unit,
  level: z.number('must be a number').min(0, 'must not be below zero').max(STOCK_LIMITS.quantityMax).nullable(),
});

export const drawSchema = z.strictObject({ acceptShortfall: z.boolean('must be true or false').default(false) });

/** A horizon of days; `to` defaults to the usual look-ahead from `from`. */
export const horizonSchema = z
  .object({ from: calendarDate, to: calendarDate })
  .refine((h) => h.to >= h.from, { path: ['to'], message: 'must not be before from' })
  .refine((h) => (Date.parse(h.to) - Date.parse(h.from)) / 86_400_000 <= STOCK_LIMITS.horizonMaxDays, { path: ['to'], message: `must be at most ${STOCK_LIMITS.horizonMaxDays} days after from` });
