import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogClose, MatDialogContent, MatDialogTitle } from '@angular/material/dialog';
import { Store } from '@ngrx/store';
import { hasShortfall, stockAmountText, StockUnit } from '@shared/stock';
import { IngredientKind } from '@shared/recipes';
import { DrawDialogActions } from '../state/draw-dialog.actions';
import { stockFeature } from '../state/stock.feature';

/**
 * Shows what drawing the batch's bill would take, lot by lot (first-expiring first), and what is
 * short, before anything is taken. With a shortfall the person must tick that they draw what there
 * is and record the rest. A container: it reads the draw from the store and dispatches the decision.
 */
@Component({
  selector: 'cw-draw-dialog',
  imports: [MatDialogTitle, MatDialogContent, MatDialogActions, MatDialogClose, MatButton, MatCheckbox],
  templateUrl: './draw-dialog.html',
  styleUrl: './draw-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DrawDialog {
  private readonly store = inject(Store);
  protected readonly batchId = inject<{ batchId: number }>(MAT_DIALOG_DATA).batchId;
  protected readonly preview = this.store.selectSignal(stockFeature.selectDrawPreview);
  protected readonly loading = this.store.selectSignal(stockFeature.selectDrawLoading);
  protected readonly saving = this.store.selectSignal(stockFeature.selectDrawSaving);
  protected readonly error = this.store.selectSignal(stockFeature.selectDrawError);
  protected readonly made = this.store.selectSignal(stockFeature.selectDrawMade);
  private readonly unitSystem = this.store.selectSignal(stockFeature.selectUnitSystem);
  protected readonly accepted = signal(false);
  protected readonly short = computed(() => hasShortfall(this.preview()?.lines ?? []));

  protected amount(kind: IngredientKind, unit: StockUnit, quantity: number): string {
    return stockAmountText(kind, unit, quantity, this.unitSystem());
  }

  protected draw(): void {
    this.store.dispatch(DrawDialogActions.drawConfirmed({ batchId: this.batchId, acceptShortfall: this.short() && this.accepted() }));
  }
}
