import {
  BrewhouseSettings,
  compareToStyle,
  hopTimingText,
  HopUse,
  IngredientCatalogue,
  predictRecipe,
  Recipe,
  shownAmountText,
  StyleTarget,
  UnitSystem,
} from '@shared/recipes';

/** The order additions happen in on the day: first wort, the boil counting down, whirlpool, dry hop. */
const USE_ORDER: Record<HopUse, number> = { 'first wort': 0, boil: 1, whirlpool: 2, 'dry hop': 3 };

const find = <T extends { id: number; name: string }>(entries: readonly T[], id: number | null) => entries.find((entry) => entry.id === id) ?? null;

/** Everything the printed brew-day sheet shows, in the person's units. */
export function brewDaySheet(recipe: Recipe, catalogue: IngredientCatalogue, brewhouse: BrewhouseSettings, style: StyleTarget | null, system: UnitSystem) {
  const design = recipe.design;
  const prediction = predictRecipe(design, catalogue, brewhouse);
  const yeast = find(catalogue.yeasts, design.yeastId);
  return {
    name: design.name,
    version: recipe.version,
    ownerName: recipe.ownerName,
    batchVolume: shownAmountText('volume', design.batchVolumeLitres, system),
    boilMinutes: design.boilMinutes,
    efficiency: design.mashEfficiencyPercent,
    styleName: style?.name ?? null,
    prediction,
    comparisons: style ? compareToStyle(prediction, style) : [],
    fermentables: design.fermentables.map((item, index) => ({
      name: find(catalogue.fermentables, item.fermentableId)?.name ?? `entry ${item.fermentableId}`,
      amount: shownAmountText('grain-mass', item.amountKg, system),
      sharePercent: prediction.shares.find((share) => share.index === index)?.sharePercent ?? null,
    })),
    mashSteps: design.mashSteps.map((step) => ({ ...step, temperature: shownAmountText('temperature', step.temperatureC, system) })),
    additions: design.hops
      .map((item, index) => ({
        when: hopTimingText(item.use, item.time),
        order: [USE_ORDER[item.use], item.use === 'dry hop' ? item.time : -item.time] as const,
        name: find(catalogue.hops, item.hopId)?.name ?? `entry ${item.hopId}`,
        amount: shownAmountText('hop-mass', item.amountGrams, system),
        ibu: prediction.hopBitterness.find((hop) => hop.index === index)?.ibu ?? null,
      }))
      .sort((a, b) => a.order[0] - b.order[0] || a.order[1] - b.order[1]),
    yeast: yeast && {
      name: yeast.name,
      temperatures: `${shownAmountText('temperature', yeast.temperatureMinC, system)} to ${shownAmountText('temperature', yeast.temperatureMaxC, system)}`,
      attenuation: `${yeast.attenuationMinPercent}–${yeast.attenuationMaxPercent} %`,
    },
    others: design.others.map((item) => ({ name: find(catalogue.others, item.otherId)?.name ?? `entry ${item.otherId}`, amount: `${item.amount} ${item.unit}`, when: item.when })),
    notes: design.notes,
    unitSystem: system,
  };
}

export type BrewDaySheetModel = ReturnType<typeof brewDaySheet>;
