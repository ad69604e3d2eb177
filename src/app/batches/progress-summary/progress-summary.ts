import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { BatchProgress } from '@shared/batches';
import { FermentationFlags } from '../fermentation-flags/fermentation-flags';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';

/** Latest gravity, apparent attenuation and ABV so far, with the finished/stuck flags. */
@Component({
  selector: 'cw-progress-summary',
  imports: [DecimalPipe, FermentationFlags, ZonedDateTimePipe],
  templateUrl: './progress-summary.html',
  styleUrl: './progress-summary.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProgressSummary {
  readonly progress = input.required<BatchProgress>();
  readonly og = input<number | null>(null);
  readonly coopTimeZone = input.required<string>();

  protected readonly hasReadings = computed(() => this.progress().readingCount > 0);
}
