import { z } from 'zod';
import { KIT_KINDS, KIT_LIMITS, KIT_STATES } from '@shared/kit';

const calendarDate = z.iso.date('a date as yyyy-MM-dd');

export const kitItemSchema = z.strictObject({
  code: z.string().trim().min(1).max(KIT_LIMITS.codeMaxLength),
  name: z.string().trim().min(1).max(KIT_LIMITS.nameMaxLength),
  kind: z.enum(KIT_KINDS),
  capacityLitres: z.number().positive().max(KIT_LIMITS.capacityMaxLitres).nullable(),
  state: z.enum(KIT_STATES),
  turnaroundHours: z.number().int().min(0).max(KIT_LIMITS.turnaroundMaxHours),
  notes: z.string().max(KIT_LIMITS.notesMaxLength).default(''),
});

export const kitItemChangesSchema = kitItemSchema.partial();

export const maintenanceEntrySchema = z
  .strictObject({
    performedOn: calendarDate,
    work: z.string().trim().min(1).max(KIT_LIMITS.maintenanceWorkMaxLength),
    performedBy: z.string().trim().min(1).max(KIT_LIMITS.maintenanceByMaxLength),
    nextDueOn: calendarDate.nullable().default(null),
  })
  .refine((entry) => entry.nextDueOn === null || entry.nextDueOn > entry.performedOn, {
    path: ['nextDueOn'],
    message: 'must be after the day the work was done',
  });
