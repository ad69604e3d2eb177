import { Knex } from 'knex';
import { z } from 'zod';
import {
  HOP_USES,
  IngredientKind,
  NAME_MAX_LENGTH,
  otherFromFreeText,
  RECIPE_EXPORT_FORMAT,
  RECIPE_EXPORT_READABLE_VERSIONS,
  RECIPE_EXPORT_VERSION,
  RecipeDesign,
  RecipeExport,
} from '@shared/recipes';
import { CATALOGUE_KINDS } from '../catalogue/catalogue-kinds';
import { catalogueRepository } from '../catalogue/catalogue.repository';
import { AppError } from '../errors/app-error';
import { parseRequest } from '../http/parse-request';
import { stylesRepository } from '../styles/styles.repository';
import { StoredVersion } from './recipes.repository';

/** A saved version in the project's own file format: ingredients by name and the properties it was saved with. */
export async function toRecipeFile(db: Knex, stored: StoredVersion): Promise<RecipeExport> {
  const { styleId, yeastId, fermentables: f, hops: h, others: o, ...rest } = stored.design;
  const { ingredients } = stored;
  const entry = <K extends IngredientKind>(kind: K, id: number) => (ingredients[kind] as IngredientKindEntry<K>[]).find((each) => each.id === id)!;
  const yeast = yeastId !== null ? entry('yeasts', yeastId) : undefined;
  const style = styleId !== null ? await stylesRepository.findById(db, styleId) : null;
  return {
    format: RECIPE_EXPORT_FORMAT,
    formatVersion: RECIPE_EXPORT_VERSION,
    exportedAt: new Date().toISOString(),
    design: {
      ...rest,
      styleName: style?.name ?? null,
      fermentables: f.map((item) => {
        const e = entry('fermentables', item.fermentableId);
        return { name: e.name, kind: e.kind, extractPercent: e.extractPercent, colourLovibond: e.colourLovibond, amountKg: item.amountKg };
      }),
      hops: h.map((item) => {
        const e = entry('hops', item.hopId);
        return { name: e.name, alphaAcidPercent: e.alphaAcidPercent, form: e.form, amountGrams: item.amountGrams, time: item.time, use: item.use };
      }),
      yeast: yeast ? { name: yeast.name, attenuationMinPercent: yeast.attenuationMinPercent, attenuationMaxPercent: yeast.attenuationMaxPercent } : null,
      others: o.map((item) => ({ name: entry('others', item.otherId).name, kind: entry('others', item.otherId).kind, amount: item.amount, unit: item.unit, when: item.when })),
    },
  };
}

type IngredientKindEntry<K extends IngredientKind> = StoredVersion['ingredients'][K][number];

const named = z.object({ name: z.string('must be text').min(1).max(NAME_MAX_LENGTH) }).passthrough();
const fileSchema = z.object({
  format: z.literal(RECIPE_EXPORT_FORMAT, `must be "${RECIPE_EXPORT_FORMAT}"`),
  formatVersion: z.union(RECIPE_EXPORT_READABLE_VERSIONS.map((v) => z.literal(v)), `must be one of ${RECIPE_EXPORT_READABLE_VERSIONS.join(', ')}`),
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

/** Reads a recipe file back into a design, matching ingredients by name as the database compares names. */
export async function fromRecipeFile(db: Knex, body: unknown): Promise<RecipeDesign> {
  const file = parseRequest(fileSchema, body);
  const { styleName, yeast, fermentables: f, hops: h, others: o, ...rest } = file.design;
  const missing: Record<string, string> = {};
  const match = async (kind: IngredientKind, names: string[], paths: string[]): Promise<number[]> => {
    const found = await catalogueRepository.findByNames(db, CATALOGUE_KINDS[kind], names);
    return found.map((entry, i) => {
      if (!entry) missing[paths[i]] = `"${names[i]}" is not in this co-op's catalogue: a brewer can add it first`;
      return (entry?.id as number | undefined) ?? 0;
    });
  };
  const [fermentableIds, hopIds, yeastIds, otherIds] = await Promise.all([
    match('fermentables', f.map((item) => item.name), f.map((_item, i) => `design.fermentables.${i}`)),
    match('hops', h.map((item) => item.name), h.map((_item, i) => `design.hops.${i}`)),
    match('yeasts', yeast ? [yeast.name] : [], ['design.yeast']),
    match('others', o.map((item) => item.name), o.map((_item, i) => `design.others.${i}`)),
  ]);
  const style = styleName ? await stylesRepository.findByName(db, styleName) : null;
  const design = {
    ...(rest as Omit<RecipeDesign, 'styleId' | 'yeastId' | 'fermentables' | 'hops' | 'others'>),
    styleId: style?.id ?? null,
    yeastId: yeast ? yeastIds[0] : null,
    fermentables: f.map((item, i) => ({ fermentableId: fermentableIds[i], amountKg: item.amountKg })),
    hops: h.map((item, i) => ({ hopId: hopIds[i], amountGrams: item.amountGrams, time: item.time, use: item.use })),
    others: o.map((item, i) => ({ otherId: otherIds[i], ...(file.formatVersion === 1 ? otherFromFreeText(item) : { amount: item.amount, unit: item.unit, when: item.when }) })),
  } as RecipeDesign;
  if (Object.keys(missing).length) {
    throw new AppError('unknown-ingredients', `Some ingredients of this file are not in the catalogue: ${Object.keys(missing).join(', ')}.`, 400, missing);
  }
  return design;
}
