import { ChangeDetectionStrategy, Component, computed, inject, OnInit } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { shoppingListExportUrl } from '../stock-client';
import { ShoppingListTable } from '../shopping-list-table/shopping-list-table';
import { ShoppingListPageActions } from '../state/shopping-list-page.actions';
import { selectShoppingListViewModel } from '../state/stock.selectors';

/** What to buy for the planned batches brewing in a chosen horizon, with the CSV to take shopping. */
@Component({
  selector: 'cw-shopping-list-page',
  imports: [FormsModule, RouterLink, MatButton, MatIcon, MatFormField, MatLabel, MatSuffix, MatInput, MatDatepicker, MatDatepickerInput, MatDatepickerToggle, ShoppingListTable],
  templateUrl: './shopping-list-page.html',
  styleUrl: './shopping-list-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShoppingListPage implements OnInit {
  private readonly store = inject(Store);
  protected readonly vm = this.store.selectSignal(selectShoppingListViewModel);
  protected readonly exportUrl = computed(() => {
    const list = this.vm().list;
    return list ? shoppingListExportUrl(list.from, list.to) : null;
  });

  ngOnInit(): void {
    this.store.dispatch(ShoppingListPageActions.opened());
  }

  /** The fields show yyyy-MM-dd (the app's date format), so their text is the request's dates. */
  protected show(from: string, to: string): void {
    if (from && to) this.store.dispatch(ShoppingListPageActions.horizonChanged({ from, to }));
  }
}
