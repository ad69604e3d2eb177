import { BrewhouseSettings } from './brewhouse-settings';
import { INGREDIENT_KINDS, IngredientCatalogue, IngredientKind } from './ingredient';
import { RecipeDesign } from './recipe-design';

type Entry = IngredientCatalogue[IngredientKind][number];

/** Ids a design uses, per kind. */
export function idsUsedBy(design: RecipeDesign): Record<IngredientKind, number[]> {
  const unique = (ids: number[]) => [...new Set(ids)];
  return {
    fermentables: unique(design.fermentables.map((item) => item.fermentableId)),
    hops: unique(design.hops.map((item) => item.hopId)),
    yeasts: design.yeastId === null ? [] : [design.yeastId],
    others: unique(design.others.map((item) => item.otherId)),
  };
}

/** The entries of `source` a design uses; ids missing from `source` are left out. */
export function ingredientsUsedBy(design: RecipeDesign, source: IngredientCatalogue): IngredientCatalogue {
  const ids = idsUsedBy(design);
  const pick = <K extends IngredientKind>(kind: K) => source[kind].filter((entry) => ids[kind].includes(entry.id)) as IngredientCatalogue[K];
  return { fermentables: pick('fermentables'), hops: pick('hops'), yeasts: pick('yeasts'), others: pick('others') };
}

/** A version's own entries with today's catalogue behind them, for ingredients added while editing. */
export function catalogueWithSnapshot(snapshot: IngredientCatalogue, catalogue: IngredientCatalogue): IngredientCatalogue {
  const merge = <K extends IngredientKind>(kind: K) => {
    const own = new Set(snapshot[kind].map((entry) => entry.id));
    return [...snapshot[kind], ...catalogue[kind].filter((entry) => !own.has(entry.id))] as IngredientCatalogue[K];
  };
  return { fermentables: merge('fermentables'), hops: merge('hops'), yeasts: merge('yeasts'), others: merge('others') };
}

/** One property a saved version holds differently from today's catalogue or brewhouse. */
export interface SnapshotChange {
  /** The ingredient kind, or "brewhouse". */
  source: IngredientKind | 'brewhouse';
  /** The entry's name as the version has it; empty for the brewhouse. */
  name: string;
  field: string;
  was: unknown;
  now: unknown;
}

const IGNORED_FIELDS = new Set(['id', 'ingredientId', 'retired']);

function entryChanges(source: IngredientKind, saved: Entry, current: Entry): SnapshotChange[] {
  return Object.keys(saved)
    .filter((field) => !IGNORED_FIELDS.has(field))
    .filter((field) => (saved as unknown as Record<string, unknown>)[field] !== (current as unknown as Record<string, unknown>)[field])
    .map((field) => ({ source, name: saved.name, field, was: (saved as unknown as Record<string, unknown>)[field], now: (current as unknown as Record<string, unknown>)[field] }));
}

/** What today's catalogue and brewhouse hold differently from a version's snapshot (entries since deleted are kept as saved). */
export function changesSinceSnapshot(
  snapshot: { ingredients: IngredientCatalogue; brewhouse: BrewhouseSettings },
  catalogue: IngredientCatalogue,
  brewhouse: BrewhouseSettings,
): SnapshotChange[] {
  const changes: SnapshotChange[] = [];
  for (const kind of INGREDIENT_KINDS) {
    for (const saved of snapshot.ingredients[kind] as Entry[]) {
      const current = (catalogue[kind] as Entry[]).find((entry) => entry.id === saved.id);
      if (current) changes.push(...entryChanges(kind, saved, current));
    }
  }
  for (const field of Object.keys(brewhouse) as (keyof BrewhouseSettings)[]) {
    if (snapshot.brewhouse[field] !== brewhouse[field]) changes.push({ source: 'brewhouse', name: '', field, was: snapshot.brewhouse[field], now: brewhouse[field] });
  }
  return changes;
}

/** JSON with object keys sorted, so two equal values always give the same text. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, inner: unknown) =>
    inner && typeof inner === 'object' && !Array.isArray(inner)
      ? Object.fromEntries(Object.entries(inner as Record<string, unknown>).sort(([a], [b]) => a.localeCompare(b)))
      : inner,
  );
}

/** True when two designs are the same in every field and amount. */
export function sameDesign(a: RecipeDesign, b: RecipeDesign): boolean {
  return canonicalJson(a) === canonicalJson(b);
}
