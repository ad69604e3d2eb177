import { z } from 'zod';
import {
  CATALOGUE_LIMITS,
  FERMENTABLE_KINDS,
  FLOCCULATION_LEVELS,
  HOP_FORMS,
  IngredientKind,
  NAME_MAX_LENGTH,
  NumberLimit,
  OTHER_ADDITION_KINDS,
} from '@shared/recipes';

const name = z.string('must be text').trim().min(1, 'must not be empty').max(NAME_MAX_LENGTH, `must be at most ${NAME_MAX_LENGTH} characters`);
const between = ({ min, max, unit }: NumberLimit) =>
  z.number('must be a number').min(min, `must be at least ${min} ${unit}`).max(max, `must be at most ${max} ${unit}`);

/** How one kind of catalogue entry is validated and stored. */
export interface CatalogueKind {
  kind: IngredientKind;
  table: 'fermentables' | 'hops' | 'yeasts' | 'other_additions';
  /** API field → column; `name` and `retired` are common to all kinds. */
  columns: Record<string, string>;
  numericFields: string[];
  schema: z.ZodType<Record<string, unknown>>;
}

const fermentableSchema = z.object({
  name,
  kind: z.enum(FERMENTABLE_KINDS, `must be one of ${FERMENTABLE_KINDS.join(', ')}`),
  extractPercent: between(CATALOGUE_LIMITS.extractPercent),
  colourLovibond: between(CATALOGUE_LIMITS.colourLovibond),
  maxSharePercent: between(CATALOGUE_LIMITS.maxSharePercent).nullable(),
});

const hopSchema = z.object({
  name,
  alphaAcidPercent: between(CATALOGUE_LIMITS.alphaAcidPercent),
  form: z.enum(HOP_FORMS, `must be one of ${HOP_FORMS.join(', ')}`),
});

const yeastSchema = z
  .object({
    name,
    attenuationMinPercent: between(CATALOGUE_LIMITS.attenuationPercent),
    attenuationMaxPercent: between(CATALOGUE_LIMITS.attenuationPercent),
    temperatureMinC: between(CATALOGUE_LIMITS.temperatureC),
    temperatureMaxC: between(CATALOGUE_LIMITS.temperatureC),
    flocculation: z.enum(FLOCCULATION_LEVELS, `must be one of ${FLOCCULATION_LEVELS.join(', ')}`),
  })
  .refine((y) => y.attenuationMinPercent <= y.attenuationMaxPercent, { path: ['attenuationMaxPercent'], message: 'must not be below the minimum' })
  .refine((y) => y.temperatureMinC <= y.temperatureMaxC, { path: ['temperatureMaxC'], message: 'must not be below the minimum' });

const otherSchema = z.object({ name, kind: z.enum(OTHER_ADDITION_KINDS, `must be one of ${OTHER_ADDITION_KINDS.join(', ')}`) });

export const CATALOGUE_KINDS: Record<IngredientKind, CatalogueKind> = {
  fermentables: {
    kind: 'fermentables',
    table: 'fermentables',
    columns: { name: 'name', kind: 'kind', extractPercent: 'extract_percent', colourLovibond: 'colour_lovibond', maxSharePercent: 'max_share_percent' },
    numericFields: ['extractPercent', 'colourLovibond', 'maxSharePercent'],
    schema: fermentableSchema,
  },
  hops: {
    kind: 'hops',
    table: 'hops',
    columns: { name: 'name', alphaAcidPercent: 'alpha_acid_percent', form: 'form' },
    numericFields: ['alphaAcidPercent'],
    schema: hopSchema,
  },
  yeasts: {
    kind: 'yeasts',
    table: 'yeasts',
    columns: {
      name: 'name',
      attenuationMinPercent: 'attenuation_min_percent',
      attenuationMaxPercent: 'attenuation_max_percent',
      temperatureMinC: 'temperature_min_c',
      temperatureMaxC: 'temperature_max_c',
      flocculation: 'flocculation',
    },
    numericFields: ['attenuationMinPercent', 'attenuationMaxPercent', 'temperatureMinC', 'temperatureMaxC'],
    schema: yeastSchema,
  },
  others: {
    kind: 'others',
    table: 'other_additions',
    columns: { name: 'name', kind: 'kind' },
    numericFields: [],
    schema: otherSchema,
  },
};
