import { ChangeDetectionStrategy, Component, computed, input, model } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import { ariaSort, nextSort, TableSort } from '../table-sort/table-sort';

/** A column header of a sortable table: a button that sorts by its column, then flips the direction. */
@Component({
  selector: 'th[cwSortHeader]',
  imports: [MatIcon],
  template: `
    <button type="button" class="sort" (click)="sortByColumn()">
      {{ label() }}
      @if (sort().column === column()) {
        <mat-icon aria-hidden="true" inline>{{ sort().direction === 'asc' ? 'arrow_upward' : 'arrow_downward' }}</mat-icon>
      }
    </button>
  `,
  styles: `
    .sort {
      all: unset;
      cursor: pointer;
      display: inline-flex;
      align-items: center;
      gap: 2px;

      &:focus-visible {
        outline: 2px solid var(--cw-spruce);
        outline-offset: 2px;
      }
    }
  `,
  host: { scope: 'col', '[attr.aria-sort]': 'ariaSort()' },
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SortHeader<K extends string> {
  readonly column = input.required<K>();
  readonly label = input.required<string>();
  readonly sort = model.required<TableSort<K>>();

  protected readonly ariaSort = computed(() => ariaSort(this.sort(), this.column()));

  protected sortByColumn(): void {
    this.sort.set(nextSort(this.sort(), this.column()));
  }
}
