import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { UnitSystem } from '@shared/recipes';
import { StockAlerts, stockAmountText } from '@shared/stock';

/** Low stock and best-before alerts for the people who keep the stock. */
@Component({
  selector: 'cw-stock-alerts',
  imports: [RouterLink],
  template: `
    @if (lowStock().length === 0 && bestBefore().length === 0) {
      <p>No stock alerts: nothing is below its reorder level or near its best-before.</p>
    } @else {
      <ul class="alerts">
        @for (item of lowStock(); track item.key) {
          <li class="low">Low: {{ item.name }}, {{ item.onHand }} left (reorder at {{ item.level }})</li>
        }
        @for (item of bestBefore(); track item.lotId) {
          <li [class.expired]="item.expired">{{ item.expired ? 'Past best-before' : 'Best before' }} {{ item.bestBefore }}: {{ item.name }}, {{ item.onHand }} in lot {{ item.lotId }}</li>
        }
      </ul>
    }
    <p><a routerLink="/stock">Open the stock</a> · <a routerLink="/stock/to-buy">What to buy</a></p>
  `,
  styles: '.alerts { padding-left: 1.2rem; } .low, .expired { font-weight: 600; color: var(--cw-copper-text); }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StockAlertsPanel {
  readonly alerts = input.required<StockAlerts>();
  readonly unitSystem = input<UnitSystem>('metric');

  protected readonly lowStock = computed(() =>
    this.alerts().lowStock.map((level) => ({
      key: `${level.ingredientId}:${level.unit}`,
      name: level.ingredientName,
      onHand: stockAmountText(level.ingredientKind, level.unit, level.onHand, this.unitSystem()),
      level: stockAmountText(level.ingredientKind, level.unit, level.reorderLevel ?? 0, this.unitSystem()),
    })),
  );
  protected readonly bestBefore = computed(() =>
    this.alerts().bestBefore.map((lot) => ({ ...lot, name: lot.ingredientName, onHand: stockAmountText(lot.ingredientKind, lot.unit, lot.onHand, this.unitSystem()) })),
  );
}
