import { FormArray } from '@angular/forms';
import { RecipeDesign } from '@shared/recipes';
import { ExactAmounts } from './exact-amounts';
import { RecipeFormGroup } from './recipe-form-groups';

type RecipeControls = RecipeFormGroup['controls'];

/** Notes the stored (SI) value behind each converted field of a design just put into the form. */
export function rememberDesignAmounts(exact: ExactAmounts, controls: RecipeControls, design: RecipeDesign): void {
  exact.remember(controls.batchVolume, design.batchVolumeLitres);
  design.fermentables.forEach((item, index) => exact.remember(controls.fermentables.at(index).controls.amount, item.amountKg));
  design.hops.forEach((item, index) => exact.remember(controls.hops.at(index).controls.amount, item.amountGrams));
  design.mashSteps.forEach((step, index) => exact.remember(controls.mashSteps.at(index).controls.temperature, step.temperatureC));
}

/** A design converted from the form with untouched converted fields at their stored values; `keep` picks the rows. */
export function withExactAmounts(exact: ExactAmounts, controls: RecipeControls, design: RecipeDesign, keep: (array: FormArray, index: number) => boolean): RecipeDesign {
  const rows = <T>(array: FormArray, items: T[], exactItem: (item: T, index: number) => T) => items.map(exactItem).filter((_item, index) => keep(array, index));
  return {
    ...design,
    batchVolumeLitres: exact.si(controls.batchVolume, design.batchVolumeLitres),
    fermentables: rows(controls.fermentables, design.fermentables, (item, i) => ({ ...item, amountKg: exact.si(controls.fermentables.at(i).controls.amount, item.amountKg) })),
    hops: rows(controls.hops, design.hops, (item, i) => ({ ...item, amountGrams: exact.si(controls.hops.at(i).controls.amount, item.amountGrams) })),
    mashSteps: rows(controls.mashSteps, design.mashSteps, (step, i) => ({ ...step, temperatureC: exact.si(controls.mashSteps.at(i).controls.temperature, step.temperatureC) })),
    others: rows(controls.others, design.others, (item) => item),
  };
}
