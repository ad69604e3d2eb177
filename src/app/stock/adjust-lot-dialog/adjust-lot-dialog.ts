import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
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
    this.form.controls.amount.addValidators(stockQuantityValidator(() => this.form.controls.entryUnit.value, true));
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
    if (reason === 'count') this.ref.close({ reason, countedQuantity: quantity, note: note.trim() });
    else this.ref.close({ reason, change: reason === 'other' && amount > 0 ? quantity : -quantity, note: note.trim() });
  }
}
