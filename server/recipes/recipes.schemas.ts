import { z } from 'zod';
import { HOP_USES, hopTimeProblem, NAME_MAX_LENGTH, NumberLimit, OTHER_UNITS, RECIPE_LIMITS, RECIPE_VISIBILITIES } from '@shared/recipes';

const within = ({ min, max, unit }: NumberLimit) =>
  z.number('must be a number').min(min, `must be at least ${min} ${unit}`).max(max, `must be at most ${max} ${unit}`);
const text = (max: number) => z.string('must be text').trim().max(max, `must be at most ${max} characters`);
const id = z.number('must be an id').int('must be a whole number').positive('must be an id');
const L = RECIPE_LIMITS;

export const recipeDesignSchema = z
  .object({
    name: text(NAME_MAX_LENGTH).min(1, 'must not be empty'),
    styleId: id.nullable(),
    batchVolumeLitres: within(L.batchVolumeLitres),
    mashEfficiencyPercent: within(L.mashEfficiencyPercent),
    boilMinutes: within(L.boilMinutes),
    fermentables: z.array(z.object({ fermentableId: id, amountKg: within(L.fermentableAmountKg) }).strict()).max(L.fermentables, `at most ${L.fermentables} fermentables`),
    hops: z
      .array(
        z
          .object({
            hopId: id,
            amountGrams: within(L.hopAmountGrams),
            time: within(L.hopTime),
            use: z.enum(HOP_USES, `must be one of ${HOP_USES.join(', ')}`),
          })
          .strict(),
      )
      .max(L.hops, `at most ${L.hops} hop additions`),
    yeastId: id.nullable(),
    others: z
      .array(
        z
          .object({
            otherId: id,
            amount: within(L.otherAmount),
            unit: z.enum(OTHER_UNITS, `must be one of ${OTHER_UNITS.join(', ')}`),
            when: text(L.otherWhenLength),
          })
          .strict(),
      )
      .max(L.others, `at most ${L.others} other additions`),
    mashSteps: z
      .array(
        z
          .object({
            name: text(L.mashStepNameLength).min(1, 'must not be empty'),
            temperatureC: within(L.mashTemperatureC),
            minutes: within(L.mashMinutes),
          })
          .strict(),
      )
      .max(L.mashSteps, `at most ${L.mashSteps} mash steps`),
    notes: z.string('must be text').max(L.notesLength, `must be at most ${L.notesLength} characters`),
  })
  .strict()
  .superRefine((design, context) => {
    design.hops.forEach((hop, index) => {
      const problem = hopTimeProblem(hop, design.boilMinutes);
      if (problem) context.addIssue({ code: 'custom', path: ['hops', index, 'time'], message: problem });
    });
  });

export const createRecipeSchema = z.object({ design: recipeDesignSchema, visibility: z.enum(RECIPE_VISIBILITIES).default('private') });
export const saveRecipeSchema = z.object({ design: recipeDesignSchema });
export const updateRecipeSchema = z
  .object({ visibility: z.enum(RECIPE_VISIBILITIES, 'must be private or coop').optional(), archived: z.boolean('must be true or false').optional() })
  .strict()
  .refine((b) => b.visibility !== undefined || b.archived !== undefined, { message: 'give visibility or archived', path: ['visibility'] });
export const cloneRecipeSchema = z.object({ name: text(NAME_MAX_LENGTH).min(1).optional() });
