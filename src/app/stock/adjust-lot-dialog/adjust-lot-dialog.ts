import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { AbstractControl, FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogClose, MatDialogContent, MatDialogRef, MatDialogTitle } from '@angular/material/dialog';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { UnitSystem } from '@shared/recipes';
import { ADJUSTMENT_REASON_LABELS, ADJUSTMENT_REASONS, AdjustLotRequest, AdjustmentReason, entryUnitsFor, STOCK_LIMITS, stockAmountText, StockLot, toStockQuantity } from '@shared/stock';
import { stockQuantityValidator } from '../stock-quantity-validator';

export interface AdjustLotDialogData {
  lot: StockLot;
  unitSystem: UnitSystem;
}

/** A hand change of one lot: a count sets what is there, spillage and spoilage take out, other changes either way. */
@Component({
  selector: 'cw-adjust-lot-dialog',
  imports: [ReactiveFormsModule, MatDialogTitle, MatDialogContent, MatDialogActions, MatDialogClose, MatButton, MatFormField, MatLabel, MatError, MatInput, MatSelect, MatOption],
  templateUrl: './adjust-lot-dialog.html',
  styleUrl: '../stock-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AdjustLotDialog {
  protected readonly data = inject<AdjustLotDialogData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<AdjustLotDialog, AdjustLotRequest>>(MatDialogRef);
  protected readonly reasons = ADJUSTMENT_REASONS;
  protected readonly reasonLabels = ADJUSTMENT_REASON_LABELS;
  protected readonly limits = STOCK_LIMITS;
  /** The entry units that store in the lot's own unit (g or kg for a lot counted in kg). */
  protected readonly units = entryUnitsFor(this.data.lot.ingredientKind, this.data.unitSystem).filter((u) => toStockQuantity(1, u).unit === this.data.lot.unit);
  protected readonly onHandText = stockAmountText(this.data.lot.ingredientKind, this.data.lot.unit, this.data.lot.onHand, this.data.unitSystem);

  protected readonly form = inject(FormBuilder).nonNullable.group({
    reason: ['spillage' as AdjustmentReason, Validators.required],
    amount: [null as number | null, [Validators.required]],
    entryUnit: [this.units[0], Validators.required],
    note: ['', Validators.maxLength(STOCK_LIMITS.adjustmentNoteMaxLength)],
  });
  protected readonly reason = toSignal(this.form.controls.reason.valueChanges, { initialValue: this.form.controls.reason.value });

  constructor() {
    // "Other" takes a signed change: its size is checked against the limit, its sign says the way.
    const withinLimit = stockQuantityValidator(() => this.form.controls.entryUnit.value, true);
    this.form.controls.amount.addValidators((control) => {
      const value = control.value as number | null;
      const signed = this.form.controls.reason.value === 'other' && typeof value === 'number';
      return withinLimit(signed ? ({ value: Math.abs(value) } as AbstractControl) : control);
    });
    this.form.controls.reason.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => this.form.controls.amount.updateValueAndValidity());
  }

  protected amountLabel(reason: AdjustmentReason): string {
    if (reason === 'count') return 'Counted on hand';
    if (reason === 'other') return 'Change (negative takes out)';
    return 'Amount taken out';
  }

  protected save(): void {
    const { reason, amount, entryUnit, note } = this.form.getRawValue();
    if (reason === 'other' && !note.trim()) this.form.controls.note.setErrors({ required: true });
    if (reason !== 'count' && amount === 0) this.form.controls.amount.setErrors({ quantity: true });
    if (this.form.invalid || amount === null) {
      this.form.markAllAsTouched();
      return;
    }
    const quantity = toStockQuantity(Math.abs(amount), entryUnit).quantity;
    const takesOut = reason !== 'count' && (reason !== 'other' || amount < 0);
    // The server refuses it too (and under a race), but here the typed figures stay in the form.
    if (takesOut && quantity > this.data.lot.onHand + 1e-9) {
      this.form.controls.amount.setErrors({ beyondOnHand: true });
      this.form.markAllAsTouched();
      return;
    }
    if (reason === 'count') this.ref.close({ reason, countedQuantity: quantity, note: note.trim() });
    else this.ref.close({ reason, change: reason === 'other' && amount > 0 ? quantity : -quantity, note: note.trim() });
  }
}
