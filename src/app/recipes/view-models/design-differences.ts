import { IngredientCatalogue, RecipeDesign, shownAmountText, UnitSystem } from '@shared/recipes';

/** One line of a side-by-side comparison of two designs. */
export interface DesignDifference {
  section: string;
  label: string;
  left: string;
  right: string;
  changed: boolean;
}

type Side = Map<string, { label: string; text: string }>;

function nameOf(entries: readonly { id: number; name: string }[], id: number | null): string {
  if (id === null) return 'none';
  return entries.find((entry) => entry.id === id)?.name ?? `entry ${id}`;
}

function sideOf(design: RecipeDesign, catalogue: IngredientCatalogue, system: UnitSystem): Record<string, Side> {
  const basics: Side = new Map([
    ['name', { label: 'Name', text: design.name }],
    ['volume', { label: 'Batch volume', text: shownAmountText('volume', design.batchVolumeLitres, system) }],
    ['efficiency', { label: 'Mash efficiency', text: `${design.mashEfficiencyPercent} %` }],
    ['boil', { label: 'Boil time', text: `${design.boilMinutes} min` }],
    ['yeast', { label: 'Yeast', text: nameOf(catalogue.yeasts, design.yeastId) }],
    ['notes', { label: 'Notes', text: design.notes || '—' }],
  ]);
  const fermentables: Side = new Map(
    design.fermentables.map((item, index) => [
      `${item.fermentableId}#${design.fermentables.slice(0, index).filter((other) => other.fermentableId === item.fermentableId).length}`,
      { label: nameOf(catalogue.fermentables, item.fermentableId), text: shownAmountText('grain-mass', item.amountKg, system) },
    ]),
  );
  const hops: Side = new Map(
    design.hops.map((item) => [
      `${item.hopId}|${item.use}|${item.time}`,
      { label: `${nameOf(catalogue.hops, item.hopId)} · ${item.use} ${item.time} ${item.use === 'dry hop' ? 'days' : 'min'}`, text: shownAmountText('hop-mass', item.amountGrams, system) },
    ]),
  );
  const mash: Side = new Map(
    design.mashSteps.map((step, index) => [
      String(index),
      { label: `Step ${index + 1}`, text: `${step.name}: ${shownAmountText('temperature', step.temperatureC, system)}, ${step.minutes} min` },
    ]),
  );
  const others: Side = new Map(
    design.others.map((item, index) => [
      `${item.otherId}#${index}`,
      { label: nameOf(catalogue.others, item.otherId), text: `${item.amount} ${item.unit}${item.when ? ', ' + item.when : ''}` },
    ]),
  );
  return { Basics: basics, Fermentables: fermentables, 'Hop additions': hops, 'Mash steps': mash, 'Other additions': others };
}

/**
 * The two designs line by line; an ingredient found on one side only shows "—" on the other. Names
 * come from each side's own catalogue (a saved version's snapshot); a line is changed exactly when
 * its shown text differs.
 */
export function designDifferences(
  left: RecipeDesign,
  right: RecipeDesign,
  catalogue: IngredientCatalogue,
  system: UnitSystem,
  rightCatalogue: IngredientCatalogue = catalogue,
): DesignDifference[] {
  const a = sideOf(left, catalogue, system);
  const b = sideOf(right, rightCatalogue, system);
  return Object.keys(a).flatMap((section) => {
    const keys = [...new Set([...a[section].keys(), ...b[section].keys()])];
    return keys.map((key) => {
      const l = a[section].get(key);
      const r = b[section].get(key);
      const leftText = l?.text ?? '—';
      const rightText = r?.text ?? '—';
      return { section, label: (l ?? r)!.label, left: leftText, right: rightText, changed: leftText !== rightText };
    });
  });
}
