import { HopUse, OtherUnit, RecipeDesign, UnitSystem, fromDisplayUnits, toDisplayUnits, RecipeQuantity } from '@shared/recipes';

/** What the form holds: amounts in the person's units; empty fields are null. */
export interface RecipeFormValue {
  name: string;
  styleId: number | null;
  batchVolume: number | null;
  mashEfficiencyPercent: number | null;
  boilMinutes: number | null;
  yeastId: number | null;
  notes: string;
  fermentables: { fermentableId: number | null; amount: number | null }[];
  hops: { hopId: number | null; amount: number | null; time: number | null; use: HopUse }[];
  mashSteps: { name: string; temperature: number | null; minutes: number | null }[];
  others: { otherId: number | null; amount: number | null; unit: OtherUnit; when: string }[];
}

// Shown to a sensible precision; a stored metric amount is never rounded.
const DECIMALS: Record<RecipeQuantity, number> = { 'grain-mass': 3, 'hop-mass': 2, volume: 3, temperature: 1 };

/** A stored amount as the form shows it. */
export function shownAmount(quantity: RecipeQuantity, si: number, system: UnitSystem): number {
  if (system === 'metric') return si;
  const factor = 10 ** DECIMALS[quantity];
  return Math.round(toDisplayUnits(quantity, si, system) * factor) / factor;
}

const stored = (quantity: RecipeQuantity, value: number | null, system: UnitSystem): number =>
  fromDisplayUnits(quantity, value ?? 0, system);

/** A stored design as the form's value in the given unit system. */
export function designToFormValue(design: RecipeDesign, system: UnitSystem): RecipeFormValue {
  return {
    name: design.name,
    styleId: design.styleId,
    batchVolume: shownAmount('volume', design.batchVolumeLitres, system),
    mashEfficiencyPercent: design.mashEfficiencyPercent,
    boilMinutes: design.boilMinutes,
    yeastId: design.yeastId,
    notes: design.notes,
    fermentables: design.fermentables.map((item) => ({ fermentableId: item.fermentableId, amount: shownAmount('grain-mass', item.amountKg, system) })),
    hops: design.hops.map((item) => ({ hopId: item.hopId, amount: shownAmount('hop-mass', item.amountGrams, system), time: item.time, use: item.use })),
    mashSteps: design.mashSteps.map((step) => ({ name: step.name, temperature: shownAmount('temperature', step.temperatureC, system), minutes: step.minutes })),
    others: design.others.map((item) => ({ ...item })),
  };
}

/** A valid form's value as a design in SI units; call only once the form's validators pass. */
export function formValueToDesign(value: RecipeFormValue, system: UnitSystem): RecipeDesign {
  return {
    name: value.name.trim(),
    styleId: value.styleId,
    batchVolumeLitres: stored('volume', value.batchVolume, system),
    mashEfficiencyPercent: value.mashEfficiencyPercent ?? 0,
    boilMinutes: value.boilMinutes ?? 0,
    yeastId: value.yeastId,
    notes: value.notes,
    fermentables: value.fermentables.map((row) => ({ fermentableId: row.fermentableId ?? 0, amountKg: stored('grain-mass', row.amount, system) })),
    hops: value.hops.map((row) => ({ hopId: row.hopId ?? 0, amountGrams: stored('hop-mass', row.amount, system), time: row.time ?? 0, use: row.use })),
    mashSteps: value.mashSteps.map((row) => ({ name: row.name.trim(), temperatureC: stored('temperature', row.temperature, system), minutes: row.minutes ?? 0 })),
    others: value.others.map((row) => ({ otherId: row.otherId ?? 0, amount: row.amount ?? 0, unit: row.unit, when: row.when.trim() })),
  };
}

/** A fresh design: one mash rest, the usual boil; the co-op's volumes fill in as the member types. */
export function emptyDesign(): RecipeDesign {
  return {
    name: '',
    styleId: null,
    batchVolumeLitres: 20,
    mashEfficiencyPercent: 72,
    boilMinutes: 60,
    fermentables: [],
    hops: [],
    yeastId: null,
    others: [],
    mashSteps: [{ name: 'Saccharification rest', temperatureC: 66, minutes: 60 }],
    notes: '',
  };
}
