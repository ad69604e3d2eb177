import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, input, viewChild } from '@angular/core';
import { MatPaginator } from '@angular/material/paginator';
import { MatSort, MatSortHeader } from '@angular/material/sort';
import { MatCell, MatCellDef, MatColumnDef, MatHeaderCell, MatHeaderCellDef, MatHeaderRow, MatHeaderRowDef, MatNoDataRow, MatRow, MatRowDef, MatTable, MatTableDataSource } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import { BATCH_STATUS_LABELS, BatchSummary } from '@shared/batches';
import { FermentationFlags } from '../fermentation-flags/fermentation-flags';

/** Batches with status, fermenter and latest gravity; sorted and paged in the browser. */
@Component({
  selector: 'cw-batch-table',
  imports: [
    RouterLink, DecimalPipe, FermentationFlags, MatTable, MatSort, MatSortHeader, MatPaginator, MatColumnDef, MatHeaderCell, MatHeaderCellDef,
    MatCell, MatCellDef, MatHeaderRow, MatHeaderRowDef, MatRow, MatRowDef, MatNoDataRow,
  ],
  templateUrl: './batch-table.html',
  styleUrl: './batch-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BatchTable {
  readonly batches = input.required<readonly BatchSummary[]>();
  /** Where a row's name links: the batch page or its gravity log. */
  readonly linkBase = input<'/batches' | '/gravity-log'>('/batches');

  private readonly sort = viewChild.required(MatSort);
  private readonly paginator = viewChild.required(MatPaginator);
  protected readonly columns = ['name', 'status', 'brewerName', 'brewDate', 'fermenterCode', 'latestSg', 'flags'];
  protected readonly source = computed(() => {
    const source = new MatTableDataSource<BatchSummary>([...this.batches()]);
    source.sortingDataAccessor = (batch, column) => (column === 'latestSg' ? (batch.progress.latestSg ?? 0) : String(batch[column as keyof BatchSummary] ?? ''));
    return source;
  });

  protected statusLabel(batch: BatchSummary): string {
    return BATCH_STATUS_LABELS[batch.status];
  }

  constructor() {
    effect(() => {
      const source = this.source();
      source.sort = this.sort();
      source.paginator = this.paginator();
    });
  }
}
