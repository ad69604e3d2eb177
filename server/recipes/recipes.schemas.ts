import { z } from 'zod';
import { HOP_USES, hopTimeProblem, MAX_HOP_TIME, RECIPE_VISIBILITIES } from '@shared/recipes';

const positive = (max: number, unit: string) =>
  z.number('must be a number').positive('must be more than 0').max(max, `must be at most ${max} ${unit}`);
const within = (min: number, max: number, unit: string) =>
  z.number('must be a number').min(min, `must be at least ${min} ${unit}`).max(max, `must be at most ${max} ${unit}`);
const id = z.number('must be an id').int('must be a whole number').positive('must be an id');

export const recipeDesignSchema = z
  .object({
    name: z.string('must be text').trim().min(1, 'must not be empty').max(100, 'must be at most 100 characters'),
    styleId: id.nullable(),
    batchVolumeLitres: positive(2000, 'L'),
    mashEfficiencyPercent: within(20, 100, '%'),
    boilMinutes: within(0, 300, 'min'),
    fermentables: z.array(z.object({ fermentableId: id, amountKg: positive(1000, 'kg') }).strict()).max(30, 'at most 30 fermentables'),
    hops: z
      .array(
        z
          .object({
            hopId: id,
            amountGrams: positive(10000, 'g'),
            time: within(0, MAX_HOP_TIME, '(min, or days for dry hop)'),
            use: z.enum(HOP_USES, `must be one of ${HOP_USES.join(', ')}`),
          })
          .strict(),
      )
      .max(40, 'at most 40 hop additions'),
    yeastId: id.nullable(),
    others: z
      .array(
        z
          .object({
            otherId: id,
            amount: positive(100000, 'units'),
            unit: z.string('must be text').trim().min(1, 'must not be empty').max(20),
            when: z.string('must be text').trim().max(60),
          })
          .strict(),
      )
      .max(30, 'at most 30 other additions'),
    mashSteps: z
      .array(z.object({ name: z.string('must be text').trim().min(1, 'must not be empty').max(60), temperatureC: within(20, 100, '°C'), minutes: within(0, 300, 'min') }).strict())
      .max(10, 'at most 10 mash steps'),
    notes: z.string('must be text').max(5000, 'must be at most 5000 characters'),
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
export const cloneRecipeSchema = z.object({ name: z.string('must be text').trim().min(1).max(100).optional() });
