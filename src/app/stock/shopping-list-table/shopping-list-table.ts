import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { UnitSystem } from '@shared/recipes';
import { ShoppingListLine, stockAmountText } from '@shared/stock';

/** What to buy, one row per ingredient, with the planned batches that need it. */
@Component({
  selector: 'cw-shopping-list-table',
  imports: [RouterLink],
  template: `
    <div class="scroller" role="region" aria-label="What to buy" tabindex="0">
      <table class="table">
        <thead>
          <tr>
            <th scope="col">Ingredient</th>
            <th scope="col">Needed</th>
            <th scope="col">In stock</th>
            <th scope="col">To buy</th>
            <th scope="col">Needed by</th>
          </tr>
        </thead>
        <tbody>
          @for (row of rows(); track row.key) {
            <tr>
              <th scope="row" class="name">{{ row.line.ingredientName }}</th>
              <td data-label="Needed">{{ row.needed }}</td>
              <td data-label="In stock">{{ row.inStock }}</td>
              <td data-label="To buy" class="to-buy">{{ row.toBuy }}</td>
              <td data-label="Needed by">
                <ul class="needs">
                  @for (need of row.needs; track need.batchId) {
                    <li><a [routerLink]="['/batches', need.batchId]">{{ need.batchName }}</a> ({{ need.brewDate }}): {{ need.amount }}</li>
                  }
                </ul>
              </td>
            </tr>
          } @empty {
            <tr>
              <td colspan="5">{{ batchCount() === 0 ? 'No batch is planned to brew in these days.' : 'Stock covers every planned batch in these days.' }}</td>
            </tr>
          }
        </tbody>
      </table>
    </div>
  `,
  styleUrl: './shopping-list-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShoppingListTable {
  readonly lines = input.required<readonly ShoppingListLine[]>();
  readonly unitSystem = input<UnitSystem>('metric');
  /** Planned batches counted in the horizon: with none, an empty list says so rather than that stock covers them. */
  readonly batchCount = input.required<number>();

  protected readonly rows = computed(() =>
    this.lines().map((line) => {
      const text = (quantity: number) => stockAmountText(line.ingredientKind, line.unit, quantity, this.unitSystem());
      return {
        key: `${line.ingredientId}:${line.unit}`,
        line,
        needed: text(line.needed),
        inStock: text(line.inStock),
        toBuy: text(line.toBuy),
        needs: line.batches.map((need) => ({ ...need, amount: text(need.amount) })),
      };
    }),
  );
}
