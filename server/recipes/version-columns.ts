import { z } from 'zod';
import {
  FERMENTABLE_KINDS,
  FLOCCULATION_LEVELS,
  HOP_FORMS,
  HOP_USES,
  IngredientCatalogue,
  BrewhouseSettings,
  OTHER_ADDITION_KINDS,
  OTHER_UNITS,
  RecipeDesign,
} from '@shared/recipes';

// The shapes of the JSON columns of recipe_versions. They check structure, not today's input limits:
// a version saved under other limits must stay readable as it was saved.

const id = z.number().int().positive();
const entry = { id, ingredientId: id, name: z.string(), retired: z.boolean() };

export const storedDesignSchema: z.ZodType<RecipeDesign> = z.object({
  name: z.string(),
  styleId: id.nullable(),
  batchVolumeLitres: z.number(),
  mashEfficiencyPercent: z.number(),
  boilMinutes: z.number(),
  fermentables: z.array(z.object({ fermentableId: id, amountKg: z.number() })),
  hops: z.array(z.object({ hopId: id, amountGrams: z.number(), time: z.number(), use: z.enum(HOP_USES) })),
  yeastId: id.nullable(),
  others: z.array(z.object({ otherId: id, amount: z.number(), unit: z.enum(OTHER_UNITS), when: z.string() })),
  mashSteps: z.array(z.object({ name: z.string(), temperatureC: z.number(), minutes: z.number() })),
  notes: z.string(),
});

export const storedIngredientsSchema: z.ZodType<IngredientCatalogue> = z.object({
  fermentables: z.array(
    z.object({ ...entry, kind: z.enum(FERMENTABLE_KINDS), extractPercent: z.number(), colourLovibond: z.number(), maxSharePercent: z.number().nullable() }),
  ),
  hops: z.array(z.object({ ...entry, alphaAcidPercent: z.number(), form: z.enum(HOP_FORMS) })),
  yeasts: z.array(
    z.object({
      ...entry,
      attenuationMinPercent: z.number(),
      attenuationMaxPercent: z.number(),
      temperatureMinC: z.number(),
      temperatureMaxC: z.number(),
      flocculation: z.enum(FLOCCULATION_LEVELS),
    }),
  ),
  others: z.array(z.object({ ...entry, kind: z.enum(OTHER_ADDITION_KINDS) })),
});

export const storedBrewhouseSchema = z.object({
  boilOffLitresPerHour: z.number(),
  grainAbsorptionLitresPerKg: z.number(),
  kettleLossLitres: z.number(),
  fermenterLossLitres: z.number(),
  mashThicknessLitresPerKg: z.number(),
  grainTemperatureC: z.number(),
  mashTunHeatCapacityKjPerK: z.number().nullable(),
  kettleCapacityLitres: z.number().nullable(),
}) satisfies z.ZodType<BrewhouseSettings>;
