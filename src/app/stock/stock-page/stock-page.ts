import { ChangeDetectionStrategy, Component, inject, OnInit } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { StockLot } from '@shared/stock';
import { LotTable } from '../lot-table/lot-table';
import { StockPageActions } from '../state/stock-page.actions';
import { selectStockPageViewModel } from '../state/stock.selectors';

/** The co-op's ingredient stock: lots, receiving, adjustments, and the way to what to buy. */
@Component({
  selector: 'cw-stock-page',
  imports: [RouterLink, MatButton, MatIcon, MatFormField, MatLabel, MatInput, LotTable],
  templateUrl: './stock-page.html',
  styleUrl: './stock-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StockPage implements OnInit {
  private readonly store = inject(Store);
  protected readonly vm = this.store.selectSignal(selectStockPageViewModel);

  ngOnInit(): void {
    this.store.dispatch(StockPageActions.opened());
  }

  protected changeFilter(filter: string): void {
    this.store.dispatch(StockPageActions.filterChanged({ filter }));
  }

  protected receiveLot(): void {
    this.store.dispatch(StockPageActions.receiveLotClicked());
  }

  protected adjustLot(lot: StockLot): void {
    this.store.dispatch(StockPageActions.adjustLotClicked({ lot }));
  }

  protected showHistory(lot: StockLot): void {
    this.store.dispatch(StockPageActions.historyClicked({ lot }));
  }

  protected setReorderLevel(lot: StockLot): void {
    this.store.dispatch(StockPageActions.reorderLevelClicked({ lot }));
  }
}
