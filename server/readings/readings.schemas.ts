import { z } from 'zod';
import { GRAVITY_UNITS, IMPORT_MODES, INSTRUMENT_UNITS, INSTRUMENTS, READING_LIMITS, READING_SORT_COLUMNS, UNIT_LABELS } from '@shared/readings';

const L = READING_LIMITS;
const between = (range: { min: number; max: number }, unit: string) =>
  z.number('must be a number').min(range.min, `must be at least ${range.min} ${unit}`).max(range.max, `must be at most ${range.max} ${unit}`);

const readingFields = {
  measuredAt: z.iso.datetime({ offset: true, message: 'must be a date and time with its offset (ISO 8601)' }),
  instrument: z.enum(INSTRUMENTS, `must be one of ${INSTRUMENTS.join(', ')}`),
  rawValue: z.number('must be a number'),
  rawUnit: z.enum(GRAVITY_UNITS, `must be one of ${GRAVITY_UNITS.join(', ')}`),
  sampleTemperatureC: between(L.sampleTemperatureC, '°C').nullable(),
  calibrationTemperatureC: between(L.calibrationTemperatureC, '°C').nullable(),
  note: z.string('must be text').max(L.noteMaxLength, `must be at most ${L.noteMaxLength} characters`).optional(),
};

/** The unit must suit the instrument and the value its unit's range. */
function checkValue(r: { instrument?: string; rawUnit?: string; rawValue?: number }, ctx: z.RefinementCtx, names = { unit: 'rawUnit', value: 'rawValue' }): void {
  const instrument = r.instrument as keyof typeof INSTRUMENT_UNITS;
  const unit = r.rawUnit as keyof typeof L.rawValue;
  if (!INSTRUMENT_UNITS[instrument]?.includes(unit)) {
    ctx.addIssue({ code: 'custom', path: [names.unit], message: `must be one of ${INSTRUMENT_UNITS[instrument].map((u) => UNIT_LABELS[u]).join(', ')} for this instrument` });
    return;
  }
  const range = L.rawValue[unit];
  if (r.rawValue! < range.min || r.rawValue! > range.max) {
    ctx.addIssue({ code: 'custom', path: [names.value], message: `must be between ${range.min} and ${range.max} ${UNIT_LABELS[unit]}` });
  }
}

export const readingInputSchema = z.object(readingFields).superRefine(checkValue);

export const readingChangesSchema = z.object(readingFields).partial();

export const readingPageSchema = z.object({
  offset: z.coerce.number('must be a number').int('must be a whole number').min(0, 'must not be negative').default(0),
  limit: z.coerce.number('must be a number').int('must be a whole number').min(1, 'must be at least 1').max(L.pageSizeMax, `must be at most ${L.pageSizeMax}`).default(L.pageSizeDefault),
  sort: z.enum(READING_SORT_COLUMNS, `must be one of ${READING_SORT_COLUMNS.join(', ')}`).default('measuredAt'),
  direction: z.enum(['asc', 'desc'], 'must be asc or desc').default('desc'),
});

export const importOptionsSchema = z.object({
  mode: z.enum(IMPORT_MODES, `must be one of ${IMPORT_MODES.join(', ')}`),
  dryRun: z.enum(['true', 'false'], 'must be true or false').default('false').transform((v) => v === 'true'),
  columns: z.string('must be the column mapping as JSON').optional(),
});

export const columnMappingSchema = z.object({
  time: z.string('must be a column name').min(1, 'must not be empty'),
  value: z.string('must be a column name').min(1, 'must not be empty'),
  temperature: z.string().min(1).nullable(),
  instrument: z.string().min(1).nullable(),
  unit: z.string().min(1).nullable(),
  fixedInstrument: z.enum(INSTRUMENTS, `must be one of ${INSTRUMENTS.join(', ')}`),
  fixedUnit: z.enum(GRAVITY_UNITS, `must be one of ${GRAVITY_UNITS.join(', ')}`),
});

export const pushReadingsSchema = z.object({
  readings: z
    .array(
      z.object({
        deviceTime: z.iso.datetime({ offset: true, message: 'must be a date and time with its offset (ISO 8601)' }),
        value: z.number('must be a number'),
        unit: z.enum(['sg', 'plato'], 'must be sg or plato').default('sg'),
        temperatureC: between(L.sampleTemperatureC, '°C').nullable().optional(),
      }).superRefine((r, ctx) => checkValue({ instrument: 'logger', rawUnit: r.unit, rawValue: r.value }, ctx, { unit: 'unit', value: 'value' })),
      'must be a list of readings',
    )
    .min(1, 'must hold at least one reading')
    .max(L.pushBatchMax, `must hold at most ${L.pushBatchMax} readings`),
});

export const pushTokenSchema = z.object({
  label: z.string('must be text').trim().min(1, 'must not be empty').max(60, 'must be at most 60 characters'),
});
