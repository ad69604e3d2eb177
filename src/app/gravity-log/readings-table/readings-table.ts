import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatIconButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatPaginator, PageEvent } from '@angular/material/paginator';
import { MatSort, MatSortHeader, Sort } from '@angular/material/sort';
import { MatCell, MatCellDef, MatColumnDef, MatHeaderCell, MatHeaderCellDef, MatHeaderRow, MatHeaderRowDef, MatNoDataRow, MatRow, MatRowDef, MatTable } from '@angular/material/table';
import { GravityReading, INSTRUMENT_LABELS, ReadingSortColumn, UNIT_LABELS } from '@shared/readings';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';

const SOURCE_LABELS = { hand: 'Typed in', file: 'File', push: 'Logger push' } as const;

/** One page of the log: raw value as read beside the corrected SG; paged and sorted by the server. */
@Component({
  selector: 'cw-readings-table',
  imports: [
    DecimalPipe, ZonedDateTimePipe, MatIcon, MatIconButton, MatTable, MatSort, MatSortHeader, MatPaginator, MatColumnDef, MatHeaderCell, MatHeaderCellDef,
    MatCell, MatCellDef, MatHeaderRow, MatHeaderRowDef, MatRow, MatRowDef, MatNoDataRow,
  ],
  templateUrl: './readings-table.html',
  styleUrl: './readings-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReadingsTable {
  readonly readings = input.required<readonly GravityReading[]>();
  readonly total = input.required<number>();
  readonly pageIndex = input.required<number>();
  readonly pageSize = input.required<number>();
  readonly sort = input.required<ReadingSortColumn>();
  readonly direction = input.required<'asc' | 'desc'>();
  readonly editable = input(false);
  readonly coopTimeZone = input.required<string>();
  readonly pageChanged = output<{ pageIndex: number; pageSize: number }>();
  readonly sortChanged = output<{ sort: ReadingSortColumn; direction: 'asc' | 'desc' }>();
  readonly editChosen = output<GravityReading>();
  readonly deleteChosen = output<GravityReading>();

  protected readonly columns = ['measuredAt', 'instrument', 'raw', 'temperature', 'correctedSg', 'source', 'actions'];

  protected instrumentLabel(r: GravityReading): string {
    return INSTRUMENT_LABELS[r.instrument];
  }

  protected unitLabel(r: GravityReading): string {
    return UNIT_LABELS[r.rawUnit];
  }

  protected sourceLabel(r: GravityReading): string {
    return SOURCE_LABELS[r.source];
  }

  protected changePage(event: PageEvent): void {
    this.pageChanged.emit({ pageIndex: event.pageIndex, pageSize: event.pageSize });
  }

  protected changeSort(event: Sort): void {
    this.sortChanged.emit({ sort: event.active as ReadingSortColumn, direction: event.direction === 'asc' ? 'asc' : 'desc' });
  }
}
