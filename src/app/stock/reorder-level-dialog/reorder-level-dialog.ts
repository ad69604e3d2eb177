import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { FormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogClose, MatDialogContent, MatDialogRef, MatDialogTitle } from '@angular/material/dialog';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { ReorderLevelRequest, entryUnitsFor, toStockQuantity } from '@shared/stock';
import { AdjustLotDialogData } from '../adjust-lot-dialog/adjust-lot-dialog';
import { stockQuantityValidator } from '../stock-quantity-validator';

/** Sets the level at or below which Today flags the ingredient as low; empty clears it. */
@Component({
  selector: 'cw-reorder-level-dialog',
  imports: [ReactiveFormsModule, MatDialogTitle, MatDialogContent, MatDialogActions, MatDialogClose, MatButton, MatFormField, MatLabel, MatError, MatSuffix, MatInput],
  template: `
    <h2 mat-dialog-title>Reorder level of {{ data.lot.ingredientName }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()">
      <mat-dialog-content class="fields">
        <p class="hint">Today shows brewers an alert when all lots of this ingredient together hold this much or less. Leave empty for no alert.</p>
        <mat-form-field appearance="outline">
          <mat-label>Reorder level</mat-label>
          <input matInput type="number" inputmode="decimal" step="any" formControlName="level" />
          <span matTextSuffix>{{ unit }}</span>
          <mat-error>Zero or more, within the stock limit.</mat-error>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit">Save level</button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: '../stock-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReorderLevelDialog {
  protected readonly data = inject<AdjustLotDialogData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<ReorderLevelDialog, ReorderLevelRequest>>(MatDialogRef);
  protected readonly unit = entryUnitsFor(this.data.lot.ingredientKind, this.data.unitSystem).find((u) => toStockQuantity(1, u).unit === this.data.lot.unit)!;
  protected readonly form = inject(FormBuilder).group({ level: [null as number | null, stockQuantityValidator(() => this.unit, true)] });

  protected save(): void {
    if (this.form.invalid) return;
    const level = this.form.controls.level.value;
    this.ref.close({ unit: this.data.lot.unit, level: level === null || (level as unknown) === '' ? null : toStockQuantity(level, this.unit).quantity });
  }
}
