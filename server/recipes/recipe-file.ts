import { Knex } from 'knex';
import { z } from 'zod';
import { HOP_USES, RECIPE_EXPORT_FORMAT, RECIPE_EXPORT_VERSION, RecipeDesign, RecipeExport } from '@shared/recipes';
import { AppError } from '../errors/app-error';
import { parseRequest } from '../http/parse-request';

type Named = { id: number; name: string } & Record<string, unknown>;

async function byId(db: Knex, table: string): Promise<Map<number, Named>> {
  return new Map((await db(table)).map((row: Named) => [row.id, row]));
}

async function byName(db: Knex, table: string): Promise<Map<string, Named>> {
  return new Map((await db(table)).map((row: Named) => [row.name.toLowerCase(), row]));
}

/** The recipe in the project's own file format: ingredients by name and properties, not by id. */
export async function toRecipeFile(db: Knex, design: RecipeDesign): Promise<RecipeExport> {
  const [fermentables, hops, yeasts, others, styles] = await Promise.all(
    ['fermentables', 'hops', 'yeasts', 'other_additions', 'style_targets'].map((t) => byId(db, t)),
  );
  const { styleId, yeastId, fermentables: f, hops: h, others: o, ...rest } = design;
  const yeast = yeastId !== null ? yeasts.get(yeastId) : undefined;
  return {
    format: RECIPE_EXPORT_FORMAT,
    formatVersion: RECIPE_EXPORT_VERSION,
    exportedAt: new Date().toISOString(),
    design: {
      ...rest,
      styleName: styleId !== null ? (styles.get(styleId)?.name ?? null) : null,
      fermentables: f.map((item) => {
        const e = fermentables.get(item.fermentableId)!;
        return { name: e.name, kind: e.kind as string, extractPercent: e.extract_percent as number, colourLovibond: e.colour_lovibond as number, amountKg: item.amountKg };
      }),
      hops: h.map((item) => {
        const e = hops.get(item.hopId)!;
        return { name: e.name, alphaAcidPercent: e.alpha_acid_percent as number, form: e.form as string, amountGrams: item.amountGrams, time: item.time, use: item.use };
      }),
      yeast: yeast ? { name: yeast.name, attenuationMinPercent: yeast.attenuation_min_percent as number, attenuationMaxPercent: yeast.attenuation_max_percent as number } : null,
      others: o.map((item) => ({ name: others.get(item.otherId)!.name, kind: others.get(item.otherId)!.kind as string, amount: item.amount, unit: item.unit, when: item.when })),
    },
  };
}

const named = z.object({ name: z.string('must be text').min(1).max(100) }).passthrough();
const fileSchema = z.object({
  format: z.literal(RECIPE_EXPORT_FORMAT, `must be "${RECIPE_EXPORT_FORMAT}"`),
  formatVersion: z.literal(RECIPE_EXPORT_VERSION, `must be ${RECIPE_EXPORT_VERSION}`),
  design: z
    .object({
      styleName: z.string().nullable(),
      fermentables: z.array(named.extend({ amountKg: z.number() })),
      hops: z.array(named.extend({ amountGrams: z.number(), time: z.number(), use: z.enum(HOP_USES) })),
      yeast: named.nullable(),
      others: z.array(named.extend({ amount: z.number(), unit: z.string(), when: z.string() })),
    })
    .passthrough(),
});

/** Reads a recipe file back into a design, matching ingredients by name in this co-op's catalogue. */
export async function fromRecipeFile(db: Knex, body: unknown): Promise<RecipeDesign> {
  const file = parseRequest(fileSchema, body);
  const [fermentables, hops, yeasts, others, styles] = await Promise.all(
    ['fermentables', 'hops', 'yeasts', 'other_additions', 'style_targets'].map((t) => byName(db, t)),
  );
  const missing: Record<string, string> = {};
  const find = (map: Map<string, Named>, name: string, path: string) => {
    const found = map.get(name.toLowerCase());
    if (!found) missing[path] = `"${name}" is not in this co-op's catalogue: a brewer can add it first`;
    return found?.id ?? 0;
  };
  const { styleName, yeast, fermentables: f, hops: h, others: o, ...rest } = file.design;
  const design = {
    ...(rest as Omit<RecipeDesign, 'styleId' | 'yeastId' | 'fermentables' | 'hops' | 'others'>),
    styleId: styleName ? (styles.get(styleName.toLowerCase())?.id ?? null) : null,
    yeastId: yeast ? find(yeasts, yeast.name, 'design.yeast') : null,
    fermentables: f.map((item, i) => ({ fermentableId: find(fermentables, item.name, `design.fermentables.${i}`), amountKg: item.amountKg })),
    hops: h.map((item, i) => ({ hopId: find(hops, item.name, `design.hops.${i}`), amountGrams: item.amountGrams, time: item.time, use: item.use })),
    others: o.map((item, i) => ({ otherId: find(others, item.name, `design.others.${i}`), amount: item.amount, unit: item.unit, when: item.when })),
  };
  if (Object.keys(missing).length) {
    throw new AppError('unknown-ingredients', `Some ingredients of this file are not in the catalogue: ${Object.keys(missing).join(', ')}.`, 400, missing);
  }
  return design;
}
