import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogClose, MatDialogContent, MatDialogRef, MatDialogTitle } from '@angular/material/dialog';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOptgroup, MatOption, MatSelect } from '@angular/material/select';
import { DateTime } from 'luxon';
import { UnitSystem } from '@shared/recipes';
import { entryUnitsFor, ReceiveLotRequest, STOCK_LIMITS, StockEntryUnit, toStockQuantity } from '@shared/stock';
import { IngredientChoice } from '../ingredient-choice';
import { stockQuantityValidator } from '../stock-quantity-validator';

export interface ReceiveLotDialogData {
  ingredients: IngredientChoice[];
  unitSystem: UnitSystem;
  today: string;
}

const KIND_LABELS = { fermentables: 'Fermentables', hops: 'Hops', yeasts: 'Yeasts', others: 'Other additions' } as const;

/** Records a delivery: which ingredient, how much in the person's units, when it came and keeps until. */
@Component({
  selector: 'cw-receive-lot-dialog',
  imports: [ReactiveFormsModule, MatDialogTitle, MatDialogContent, MatDialogActions, MatDialogClose, MatButton, MatFormField, MatLabel, MatError, MatHint, MatInput, MatSelect, MatOption, MatOptgroup, MatSuffix, MatDatepicker, MatDatepickerInput, MatDatepickerToggle],
  templateUrl: './receive-lot-dialog.html',
  styleUrl: '../stock-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReceiveLotDialog {
  protected readonly data = inject<ReceiveLotDialogData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<ReceiveLotDialog, ReceiveLotRequest>>(MatDialogRef);
  protected readonly limits = STOCK_LIMITS;
  protected readonly groups = (Object.keys(KIND_LABELS) as (keyof typeof KIND_LABELS)[])
    .map((kind) => ({ kind, label: KIND_LABELS[kind], items: this.data.ingredients.filter((i) => i.kind === kind) }))
    .filter((group) => group.items.length > 0);

  protected readonly form = inject(FormBuilder).nonNullable.group({
    ingredientId: [null as number | null, Validators.required],
    quantity: [null as number | null, [Validators.required, stockQuantityValidator(() => this.entryUnit())]],
    entryUnit: [null as StockEntryUnit | null, Validators.required],
    receivedOn: [DateTime.fromISO(this.data.today) as DateTime | null, Validators.required],
    bestBefore: [null as DateTime | null],
    supplierNote: ['', Validators.maxLength(STOCK_LIMITS.supplierNoteMaxLength)],
  });

  private entryUnit(): StockEntryUnit | null {
    // Validators first run while the form is being built, before this.form is set.
    return (this.form as typeof this.form | undefined)?.controls.entryUnit.value ?? null;
  }

  private readonly ingredientId = toSignal(this.form.controls.ingredientId.valueChanges, { initialValue: null });
  protected readonly units = computed(() => {
    const chosen = this.data.ingredients.find((i) => i.ingredientId === this.ingredientId());
    return chosen ? entryUnitsFor(chosen.kind, this.data.unitSystem) : [];
  });

  constructor() {
    this.form.controls.ingredientId.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => {
      const units = this.units();
      this.form.controls.entryUnit.setValue(units.length === 1 || !units.includes(this.form.controls.entryUnit.value!) ? (units[0] ?? null) : this.form.controls.entryUnit.value);
    });
  }

  protected receive(): void {
    const receivedOn = this.form.controls.receivedOn.value?.toISODate() ?? '';
    const bestBefore = this.form.controls.bestBefore.value?.toISODate() ?? null;
    if (bestBefore && bestBefore < receivedOn) this.form.controls.bestBefore.setErrors({ beforeReceived: true });
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    const { unit, quantity } = toStockQuantity(value.quantity!, value.entryUnit!);
    this.ref.close({ ingredientId: value.ingredientId!, unit, quantity, receivedOn, bestBefore, supplierNote: value.supplierNote.trim() });
  }
}
