import { AbstractControl, FormControl, FormGroup, NonNullableFormBuilder, ValidationErrors, ValidatorFn, Validators } from '@angular/forms';
import { HopUse, hopTimeProblem, NAME_MAX_LENGTH, OtherUnit, RECIPE_LIMITS, RecipeQuantity, toDisplayUnits, UnitSystem } from '@shared/recipes';
import { RecipeFormValue } from '../view-models/recipe-form-model';

const L = RECIPE_LIMITS;

export type FermentableGroup = FormGroup<{ fermentableId: FormControl<number | null>; amount: FormControl<number | null> }>;
export type HopGroup = FormGroup<{ hopId: FormControl<number | null>; amount: FormControl<number | null>; time: FormControl<number | null>; use: FormControl<HopUse> }>;
export type MashStepGroup = FormGroup<{ name: FormControl<string>; temperature: FormControl<number | null>; minutes: FormControl<number | null> }>;
export type OtherGroup = FormGroup<{ otherId: FormControl<number | null>; amount: FormControl<number | null>; unit: FormControl<OtherUnit>; when: FormControl<string> }>;

/** The longest boil the API stores, min. */
export const MAX_MINUTES = L.boilMinutes.max;

/** The largest amounts the API stores, in SI units (from the shared limits). */
export const SI_LIMITS = { batchVolumeLitres: L.batchVolumeLitres.max, amountKg: L.fermentableAmountKg.max, amountGrams: L.hopAmountGrams.max } as const;

/** An SI limit in the person's units, rounded down so the converted value stays within it. */
export function limitIn(quantity: RecipeQuantity, siLimit: number, system: UnitSystem): number {
  return Math.floor(toDisplayUnits(quantity, siLimit, system));
}

/** An SI lower limit in the person's units, rounded up (to 0.001) so the converted value stays within it. */
export function minimumIn(quantity: RecipeQuantity, siLimit: number, system: UnitSystem): number {
  return Math.ceil(toDisplayUnits(quantity, siLimit, system) * 1000) / 1000;
}

/** A hop row's time against the boil, by the same rule the API applies; the boil time is read when validating. */
export function hopTimeWithinBoil(boilMinutes: () => number | null): ValidatorFn {
  return (control: AbstractControl): ValidationErrors | null => {
    const use = control.parent?.get('use')?.value as HopUse | undefined;
    const boil = boilMinutes();
    if (use === undefined || boil === null || control.value === null) return null;
    const problem = hopTimeProblem({ use, time: control.value }, boil);
    return problem ? { hopTime: problem } : null;
  };
}

/** Builds the form's row groups with their validators. */
export function recipeRowGroups(fb: NonNullableFormBuilder, boilMinutes: () => number | null = () => null) {
  return {
    fermentable(system: UnitSystem, row: RecipeFormValue['fermentables'][number] = { fermentableId: null, amount: null }): FermentableGroup {
      return fb.group({
        fermentableId: fb.control<number | null>(row.fermentableId, Validators.required),
        amount: fb.control<number | null>(row.amount, [
          Validators.required,
          Validators.min(minimumIn('grain-mass', L.fermentableAmountKg.min, system)),
          Validators.max(limitIn('grain-mass', SI_LIMITS.amountKg, system)),
        ]),
      });
    },
    hop(system: UnitSystem, row: RecipeFormValue['hops'][number] = { hopId: null, amount: null, time: 60, use: 'boil' }): HopGroup {
      return fb.group({
        hopId: fb.control<number | null>(row.hopId, Validators.required),
        amount: fb.control<number | null>(row.amount, [
          Validators.required,
          Validators.min(minimumIn('hop-mass', L.hopAmountGrams.min, system)),
          Validators.max(limitIn('hop-mass', SI_LIMITS.amountGrams, system)),
        ]),
        time: fb.control<number | null>(row.time, [Validators.required, Validators.min(L.hopTime.min), Validators.max(L.hopTime.max), hopTimeWithinBoil(boilMinutes)]),
        use: fb.control<HopUse>(row.use, Validators.required),
      });
    },
    mashStep(row: RecipeFormValue['mashSteps'][number], system: UnitSystem): MashStepGroup {
      const [min, max] = [L.mashTemperatureC.min, L.mashTemperatureC.max].map((celsius) => toDisplayUnits('temperature', celsius, system));
      return fb.group({
        name: fb.control(row.name, [Validators.required, Validators.maxLength(L.mashStepNameLength)]),
        temperature: fb.control<number | null>(row.temperature, [Validators.required, Validators.min(min), Validators.max(max)]),
        minutes: fb.control<number | null>(row.minutes, [Validators.required, Validators.min(L.mashMinutes.min), Validators.max(L.mashMinutes.max)]),
      });
    },
    other(row: RecipeFormValue['others'][number] = { otherId: null, amount: null, unit: 'g', when: '' }): OtherGroup {
      return fb.group({
        otherId: fb.control<number | null>(row.otherId, Validators.required),
        amount: fb.control<number | null>(row.amount, [Validators.required, Validators.min(L.otherAmount.min), Validators.max(L.otherAmount.max)]),
        unit: fb.control<OtherUnit>(row.unit, Validators.required),
        when: fb.control(row.when, Validators.maxLength(L.otherWhenLength)),
      });
    },
  };
}

/** The whole recipe form: its fields with their validators and one empty row of each kind. */
export function recipeFormGroup(fb: NonNullableFormBuilder, rows: ReturnType<typeof recipeRowGroups>) {
  return fb.group({
    name: ['', [Validators.required, Validators.maxLength(NAME_MAX_LENGTH)]],
    styleId: fb.control<number | null>(null),
    batchVolume: fb.control<number | null>(null),
    mashEfficiencyPercent: fb.control<number | null>(null, [Validators.required, Validators.min(L.mashEfficiencyPercent.min), Validators.max(L.mashEfficiencyPercent.max)]),
    boilMinutes: fb.control<number | null>(null, [Validators.required, Validators.min(L.boilMinutes.min), Validators.max(MAX_MINUTES)]),
    yeastId: fb.control<number | null>(null),
    notes: ['', Validators.maxLength(L.notesLength)],
    fermentables: fb.array([rows.fermentable('metric')]),
    hops: fb.array([rows.hop('metric')]),
    mashSteps: fb.array([rows.mashStep({ name: '', temperature: null, minutes: null }, 'metric')]),
    others: fb.array([rows.other()]),
  });
}

export type RecipeFormGroup = ReturnType<typeof recipeFormGroup>;
