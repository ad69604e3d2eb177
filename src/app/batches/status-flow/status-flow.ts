import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatMenu, MatMenuItem, MatMenuTrigger } from '@angular/material/menu';
import { BATCH_STATUS_LABELS, BATCH_STATUSES, BatchStatus, BatchStatusDates, nextStatus } from '@shared/batches';
import { CoopTimePipe } from '../coop-time-pipe';

/** The status flow with the date each status was reached; moves forward one step, or further after asking. */
@Component({
  selector: 'cw-status-flow',
  imports: [MatButton, MatMenu, MatMenuItem, MatMenuTrigger, CoopTimePipe],
  templateUrl: './status-flow.html',
  styleUrl: './status-flow.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StatusFlow {
  readonly status = input.required<BatchStatus>();
  readonly dates = input.required<BatchStatusDates>();
  readonly editable = input(false);
  readonly busy = input(false);
  readonly coopTimeZone = input.required<string>();
  readonly moveChosen = output<BatchStatus>();

  protected readonly labels = BATCH_STATUS_LABELS;
  protected readonly steps = computed(() => {
    const reached = BATCH_STATUSES.indexOf(this.status());
    return BATCH_STATUSES.map((status, i) => ({ status, date: this.dates()[status], current: i === reached, past: i < reached }));
  });
  protected readonly next = computed(() => nextStatus(this.status()));
  /** Later statuses past the next one: reaching them skips steps. */
  protected readonly further = computed(() => BATCH_STATUSES.slice(BATCH_STATUSES.indexOf(this.status()) + 2));
}
