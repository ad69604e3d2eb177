import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatRadioButton, MatRadioGroup } from '@angular/material/radio';
import { RouterLink } from '@angular/router';
import { ReferenceTableSummary } from '@shared/reference-tables';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';

/** The uploaded tables, and (for brewers) the choice of which one the lab analysis reads. */
@Component({
  selector: 'cw-reference-table-list',
  imports: [ZonedDateTimePipe, DecimalPipe, RouterLink, MatRadioGroup, MatRadioButton],
  templateUrl: './reference-table-list.html',
  styleUrl: './reference-table-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReferenceTableList {
  readonly tables = input.required<ReferenceTableSummary[]>();
  readonly labTableId = input<number | null>(null);
  readonly canChoose = input(false);
  /** Until the list has arrived, say so rather than "no table yet". */
  readonly loading = input(false);
  readonly timeZone = input.required<string>();
  readonly labTableChosen = output<number | null>();
}
