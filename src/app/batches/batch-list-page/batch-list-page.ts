import { ChangeDetectionStrategy, Component, inject, input, OnInit } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatButtonToggle, MatButtonToggleGroup } from '@angular/material/button-toggle';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { BatchTable } from '../batch-table/batch-table';
import { BatchListPageActions } from '../state/batch-list-page.actions';
import { selectBatchListViewModel } from '../state/batches.selectors';

/** The co-op's batches, or the person's active ones; from the Gravity log area the rows open the log. */
@Component({
  selector: 'cw-batch-list-page',
  imports: [BatchTable, RouterLink, MatButton, MatIcon, MatButtonToggleGroup, MatButtonToggle],
  templateUrl: './batch-list-page.html',
  styleUrl: './batch-list-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BatchListPage implements OnInit {
  private readonly store = inject(Store);
  /** Set by the route: which page a row opens. */
  readonly linkBase = input<'/batches' | '/gravity-log'>('/batches');

  protected readonly vm = this.store.selectSignal(selectBatchListViewModel);

  ngOnInit(): void {
    this.store.dispatch(BatchListPageActions.opened({ mine: this.linkBase() === '/gravity-log' }));
  }

  protected changeScope(mine: boolean): void {
    this.store.dispatch(BatchListPageActions.scopeChanged({ mine }));
  }
}
