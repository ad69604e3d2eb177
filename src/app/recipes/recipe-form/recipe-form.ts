import { ChangeDetectionStrategy, Component, computed, DestroyRef, effect, inject, input, output, untracked } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormArray, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { IngredientCatalogue, RECIPE_LIMITS, RecipeDesign, StyleTarget, unitLabel, UnitSystem } from '@shared/recipes';
import { FermentableRows } from '../fermentable-rows/fermentable-rows';
import { HopRows } from '../hop-rows/hop-rows';
import { MashStepRows } from '../mash-step-rows/mash-step-rows';
import { OtherRows } from '../other-rows/other-rows';
import { limitIn, minimumIn, recipeFormGroup, recipeRowGroups, SI_LIMITS } from './recipe-form-groups';
import { ExactAmounts } from './exact-amounts';
import { rememberDesignAmounts, withExactAmounts } from './exact-design';
import { designToFormValue, formValueToDesign } from '../view-models/recipe-form-model';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** The recipe as a reactive form in the person's units; emits the design (SI) as it is typed. */
@Component({
  selector: 'cw-recipe-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatHint, MatSuffix, MatInput, MatSelect, MatOption, MatButton,
    FermentableRows, HopRows, MashStepRows, OtherRows],
  templateUrl: './recipe-form.html',
  styleUrl: './recipe-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RecipeForm {
  private readonly fb = inject(NonNullableFormBuilder);
  readonly design = input.required<RecipeDesign>();
  /** Goes up whenever `design` must replace what is typed. */
  readonly revision = input(0);
  readonly unitSystem = input<UnitSystem>('metric');
  readonly catalogue = input.required<IngredientCatalogue>();
  readonly styles = input<readonly StyleTarget[]>([]);
  readonly editable = input(true);
  readonly saving = input(false);
  readonly designChanged = output<RecipeDesign | null>();
  readonly saveSubmitted = output<RecipeDesign>();
  /** The person changed something since the design was last put into the form. */
  readonly edited = output<void>();

  protected readonly rows = recipeRowGroups(this.fb, () => this.form?.controls.boilMinutes.value ?? null);
  protected readonly form = recipeFormGroup(this.fb, this.rows);
  private shownSystem: UnitSystem = 'metric';
  private readonly exact = new ExactAmounts();

  protected readonly label = (quantity: Parameters<typeof unitLabel>[0]) => unitLabel(quantity, this.unitSystem());
  protected readonly maxVolume = computed(() => limitIn('volume', SI_LIMITS.batchVolumeLitres, this.unitSystem()));

  constructor() {
    // The design is read untracked: it follows every keystroke, and only a new revision replaces what is typed.
    effect(() => {
      this.revision();
      const system = this.unitSystem();
      const editable = this.editable();
      untracked(() => {
        this.load(this.design(), system, editable);
        this.designChanged.emit(this.liveDesign());
      });
    });
    this.form.valueChanges.pipe(takeUntilDestroyed(inject(DestroyRef))).subscribe(() => {
      this.revalidateHopTimes();
      if (this.form.dirty) this.edited.emit();
      this.designChanged.emit(this.liveDesign());
    });
  }

  protected addFermentable(): void {
    this.form.markAsDirty();
    this.form.controls.fermentables.push(this.rows.fermentable(this.unitSystem()));
  }

  protected addHop(): void {
    this.form.markAsDirty();
    this.form.controls.hops.push(this.rows.hop(this.unitSystem()));
  }

  protected addMashStep(): void {
    this.form.markAsDirty();
    this.form.controls.mashSteps.push(this.rows.mashStep({ name: '', temperature: null, minutes: null }, this.unitSystem()));
  }

  protected addOther(): void {
    this.form.markAsDirty();
    this.form.controls.others.push(this.rows.other());
  }

  protected removeRow(rows: FormArray, index: number): void {
    this.form.markAsDirty();
    rows.removeAt(index);
  }

  protected submit(): void {
    if (!readyToSubmit(this.form)) return;
    this.saveSubmitted.emit(this.designFromForm());
  }

  /** Hop times depend on the boil time and each row's use, so they are checked again when either changes. */
  private revalidateHopTimes(): void {
    for (const group of this.form.controls.hops.controls) group.controls.time.updateValueAndValidity({ emitEvent: false });
  }

  /** Puts a design into the form; when only the unit system changed, what is typed is kept and converted. */
  private load(design: RecipeDesign, system: UnitSystem, editable: boolean): void {
    const typed = this.form.dirty && system !== this.shownSystem && this.form.valid;
    const source = typed ? this.designFromForm() : design;
    this.shownSystem = system;
    const value = designToFormValue(source, system);
    this.form.setControl('fermentables', this.fb.array(value.fermentables.map((row) => this.rows.fermentable(system, row))), { emitEvent: false });
    this.form.setControl('hops', this.fb.array(value.hops.map((row) => this.rows.hop(system, row))), { emitEvent: false });
    this.form.controls.batchVolume.setValidators([
      Validators.required,
      Validators.min(minimumIn('volume', RECIPE_LIMITS.batchVolumeLitres.min, system)),
      Validators.max(limitIn('volume', SI_LIMITS.batchVolumeLitres, system)),
    ]);
    this.form.setControl('mashSteps', this.fb.array(value.mashSteps.map((row) => this.rows.mashStep(row, system))), { emitEvent: false });
    this.form.setControl('others', this.fb.array(value.others.map((row) => this.rows.other(row))), { emitEvent: false });
    this.form.patchValue(value, { emitEvent: false });
    if (editable) this.form.enable({ emitEvent: false });
    else this.form.disable({ emitEvent: false });
    if (!typed) this.form.markAsPristine();
    rememberDesignAmounts(this.exact, this.form.controls, source);
  }

  /** The form as a design in SI units, untouched converted fields at their stored values; `keep` picks the rows. */
  private designFromForm(keep: (array: FormArray, index: number) => boolean = () => true): RecipeDesign {
    return withExactAmounts(this.exact, this.form.controls, formValueToDesign(this.form.getRawValue(), this.shownSystem), keep);
  }

  /** The design as typed so far: half-filled rows are left out, so the predictions follow every keystroke. */
  private liveDesign(): RecipeDesign | null {
    const { controls } = this.form;
    if (controls.batchVolume.invalid || controls.mashEfficiencyPercent.invalid || controls.boilMinutes.invalid) return null;
    const design = this.designFromForm((array, index) => array.at(index).valid);
    return { ...design, name: design.name || 'Untitled' };
  }
}
