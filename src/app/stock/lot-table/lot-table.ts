import { ChangeDetectionStrategy, Component, computed, input, model, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { UnitSystem } from '@shared/recipes';
import { stockAmountText, StockLot } from '@shared/stock';
import { SortHeader } from '@app/ui/sort-header/sort-header';
import { sortRows, TableSort } from '@app/ui/table-sort/table-sort';

export type LotColumn = 'ingredientName' | 'onHand' | 'receivedOn' | 'bestBefore';

const SORTABLE: { key: LotColumn; label: string }[] = [
  { key: 'ingredientName', label: 'Ingredient' },
  { key: 'onHand', label: 'On hand' },
  { key: 'receivedOn', label: 'Received' },
  { key: 'bestBefore', label: 'Best before' },
];

const KIND_LABELS = { fermentables: 'Fermentable', hops: 'Hop', yeasts: 'Yeast', others: 'Other' } as const;

const valueOf = (lot: StockLot, column: string): string | number | null =>
  column === 'onHand' ? lot.onHand : column === 'receivedOn' ? lot.receivedOn : column === 'bestBefore' ? lot.bestBefore : lot.ingredientName;

/** The lots with what is left of each; at phone width each lot is a card. */
@Component({
  selector: 'cw-lot-table',
  imports: [SortHeader, MatButton],
  templateUrl: './lot-table.html',
  styleUrl: './lot-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotTable {
  readonly lots = input.required<readonly StockLot[]>();
  readonly unitSystem = input<UnitSystem>('metric');
  readonly mayKeep = input(false);
  /** The search typed, to say nothing matched it. */
  readonly filter = input('');
  readonly adjustClicked = output<StockLot>();
  readonly reorderLevelClicked = output<StockLot>();
  readonly historyClicked = output<StockLot>();
  readonly sort = model<TableSort<LotColumn>>({ column: 'bestBefore', direction: 'asc' });

  protected readonly sortable = SORTABLE;
  protected readonly kindLabels = KIND_LABELS;
  protected readonly rows = computed(() =>
    sortRows(this.lots(), this.sort(), valueOf).map((lot) => ({
      lot,
      onHand: stockAmountText(lot.ingredientKind, lot.unit, lot.onHand, this.unitSystem()),
      received: stockAmountText(lot.ingredientKind, lot.unit, lot.receivedQuantity, this.unitSystem()),
    })),
  );
}
