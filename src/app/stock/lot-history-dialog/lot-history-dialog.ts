import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogClose, MatDialogContent, MatDialogTitle } from '@angular/material/dialog';
import { UnitSystem } from '@shared/recipes';
import { ADJUSTMENT_REASON_LABELS, stockAmountText, StockLot, StockMovement } from '@shared/stock';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';

export interface LotHistoryDialogData {
  lot: StockLot;
  movements: StockMovement[];
  unitSystem: UnitSystem;
  /** The co-op's zone: every movement reads on its clocks. */
  timeZone: string;
}

const KIND_LABELS = { receipt: 'Received', draw: 'Drawn', adjustment: 'Adjusted' } as const;

/** Every movement of one lot, oldest first, as recorded (none is ever rewritten). */
@Component({
  selector: 'cw-lot-history-dialog',
  imports: [ZonedDateTimePipe, MatDialogTitle, MatDialogContent, MatDialogActions, MatDialogClose, MatButton],
  template: `
    <h2 mat-dialog-title>History of lot {{ data.lot.id }}: {{ data.lot.ingredientName }}</h2>
    <mat-dialog-content>
      <ol class="movements">
        @for (row of rows; track row.movement.id) {
          <li>
            <strong>{{ row.kind }} {{ row.change }}</strong>, leaving {{ row.after }}
            <span class="meta">
              {{ row.movement.createdAt | cwZonedDateTime: data.timeZone }} · {{ row.movement.byName }}
              @if (row.movement.batchId !== null) {
                · for {{ row.movement.batchName }}
              }
              @if (row.reason) {
                · {{ row.reason }}
              }
              @if (row.movement.note) {
                · {{ row.movement.note }}
              }
            </span>
          </li>
        }
      </ol>
    </mat-dialog-content>
    <mat-dialog-actions align="end"><button mat-button type="button" mat-dialog-close>Close</button></mat-dialog-actions>
  `,
  styles: '.movements { padding-left: 1.2rem; } .movements li { margin-bottom: 8px; } .meta { display: block; font-size: 0.875rem; color: var(--mat-sys-on-surface-variant); }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotHistoryDialog {
  protected readonly data = inject<LotHistoryDialogData>(MAT_DIALOG_DATA);
  private readonly amount = (quantity: number) => stockAmountText(this.data.lot.ingredientKind, this.data.lot.unit, quantity, this.data.unitSystem);
  protected readonly rows = this.data.movements.map((movement) => ({
    movement,
    kind: KIND_LABELS[movement.kind],
    change: `${movement.change < 0 ? '−' : '+'}${this.amount(Math.abs(movement.change))}`,
    after: this.amount(movement.onHandAfter),
    reason: movement.reason ? ADJUSTMENT_REASON_LABELS[movement.reason] : null,
  }));
}
