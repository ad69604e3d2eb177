import { AbstractControl, FormControl, FormGroup, NonNullableFormBuilder, ValidationErrors, ValidatorFn, Validators } from '@angular/forms';
import { HopUse, hopTimeProblem, MAX_HOP_TIME, RecipeQuantity, toDisplayUnits, UnitSystem } from '@shared/recipes';
import { RecipeFormValue } from '../view-models/recipe-form-model';

/** Mash temperatures the form accepts, °C; converted for a US-unit person. */
const MASH_MIN_C = 30;
const MASH_MAX_C = 80;

export type FermentableGroup = FormGroup<{ fermentableId: FormControl<number | null>; amount: FormControl<number | null> }>;
export type HopGroup = FormGroup<{ hopId: FormControl<number | null>; amount: FormControl<number | null>; time: FormControl<number | null>; use: FormControl<HopUse> }>;
export type MashStepGroup = FormGroup<{ name: FormControl<string>; temperature: FormControl<number | null>; minutes: FormControl<number | null> }>;
export type OtherGroup = FormGroup<{ otherId: FormControl<number | null>; amount: FormControl<number | null>; unit: FormControl<string>; when: FormControl<string> }>;

/** The longest boil or hop time the science library's Tinseth utilisation accepts, min. */
export const MAX_MINUTES = 300;

/** The largest amounts the API stores, in SI units. */
export const SI_LIMITS = { batchVolumeLitres: 2000, amountKg: 1000, amountGrams: 10000 } as const;

/** An SI limit in the person's units, rounded down so the converted value stays within it. */
export function limitIn(quantity: RecipeQuantity, siLimit: number, system: UnitSystem): number {
  return Math.floor(toDisplayUnits(quantity, siLimit, system));
}

const positive = [Validators.required, Validators.min(0.001)];

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
        amount: fb.control<number | null>(row.amount, [...positive, Validators.max(limitIn('grain-mass', SI_LIMITS.amountKg, system))]),
      });
    },
    hop(system: UnitSystem, row: RecipeFormValue['hops'][number] = { hopId: null, amount: null, time: 60, use: 'boil' }): HopGroup {
      return fb.group({
        hopId: fb.control<number | null>(row.hopId, Validators.required),
        amount: fb.control<number | null>(row.amount, [...positive, Validators.max(limitIn('hop-mass', SI_LIMITS.amountGrams, system))]),
        time: fb.control<number | null>(row.time, [Validators.required, Validators.min(0), Validators.max(MAX_HOP_TIME), hopTimeWithinBoil(boilMinutes)]),
        use: fb.control<HopUse>(row.use, Validators.required),
      });
    },
    mashStep(row: RecipeFormValue['mashSteps'][number], system: UnitSystem): MashStepGroup {
      const [min, max] = [MASH_MIN_C, MASH_MAX_C].map((celsius) => toDisplayUnits('temperature', celsius, system));
      return fb.group({
        name: fb.control(row.name, [Validators.required, Validators.maxLength(60)]),
        temperature: fb.control<number | null>(row.temperature, [Validators.required, Validators.min(min), Validators.max(max)]),
        minutes: fb.control<number | null>(row.minutes, [Validators.required, Validators.min(1), Validators.max(300)]),
      });
    },
    other(row: RecipeFormValue['others'][number] = { otherId: null, amount: null, unit: 'g', when: '' }): OtherGroup {
      return fb.group({
        otherId: fb.control<number | null>(row.otherId, Validators.required),
        amount: fb.control<number | null>(row.amount, [...positive, Validators.max(100000)]),
        unit: fb.control(row.unit, [Validators.required, Validators.maxLength(20)]),
        when: fb.control(row.when, Validators.maxLength(60)),
      });
    },
  };
}
