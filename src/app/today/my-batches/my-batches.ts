import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { BATCH_STATUS_LABELS, BatchSummary } from '@shared/batches';
import type { ForecastOutlook } from '@shared/fermentation';
import { forecastOutlookText } from '../forecast-outlook-text';
import { FermentationFlags } from '@app/batches/fermentation-flags/fermentation-flags';

/** The person's active batches: status, latest gravity, attenuation, the finished/stuck flags and the forecast. */
@Component({
  selector: 'cw-my-batches',
  imports: [RouterLink, DecimalPipe, FermentationFlags],
  template: `
    <ul class="batches">
      @for (batch of batches(); track batch.id) {
        <li>
          <a [routerLink]="['/gravity-log', batch.id]" class="name">{{ batch.name }}</a>
          <span>{{ statusLabel(batch) }}{{ batch.fermenterCode ? ' · ' + batch.fermenterCode : '' }}</span>
          <span>SG {{ batch.progress.latestSg === null ? '—' : (batch.progress.latestSg | number: '1.3-3') }}</span>
          @if (batch.progress.apparentAttenuationPercent !== null) {
            <span>{{ batch.progress.apparentAttenuationPercent | number: '1.0-0' }} % attenuated</span>
          }
          <cw-fermentation-flags [progress]="batch.progress" />
          @if (batch.forecast; as forecast) {
            <span class="forecast" data-testid="today-forecast">{{ forecastText(forecast) }}</span>
          }
        </li>
      } @empty {
        <li>No active batches. <a routerLink="/batches/new">Start a batch</a>.</li>
      }
    </ul>
  `,
  styles: `
    .batches { list-style: none; padding: 0; margin: 0 0 16px; }
    li { display: flex; flex-wrap: wrap; gap: 4px 14px; align-items: center; padding: 8px 0; border-bottom: 1px solid #e6e0d6; }
    .name { font-weight: 700; }
    .forecast { flex-basis: 100%; font-size: 0.9rem; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MyBatches {
  readonly batches = input.required<readonly BatchSummary[]>();
  /** The co-op's time zone, for the forecast's finish day. */
  readonly timeZone = input('UTC');

  protected forecastText(forecast: ForecastOutlook): string {
    return forecastOutlookText(forecast, this.timeZone());
  }

  protected statusLabel(batch: BatchSummary): string {
    return BATCH_STATUS_LABELS[batch.status];
  }
}
