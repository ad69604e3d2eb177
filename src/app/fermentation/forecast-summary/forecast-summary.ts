import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { DateTime } from 'luxon';
import type { FermentationChartData } from '@shared/fermentation';

/** Attenuation and ABV so far, and the forecast final gravity and finish day with their bands. */
@Component({
  selector: 'cw-forecast-summary',
  imports: [DecimalPipe],
  template: `
    @let d = data();
    <dl class="figures">
      <div><dt>Apparent attenuation so far</dt><dd data-testid="attenuation">{{ d.apparentAttenuationPercent === null ? '–' : (d.apparentAttenuationPercent | number: '1.0-0') + ' %' }}</dd></div>
      <div><dt>ABV so far (OG/FG estimate)</dt><dd data-testid="abv-so-far">{{ d.abvSoFar === null ? '–' : (d.abvSoFar | number: '1.1-1') + ' % vol' }}</dd></div>
      @if (d.forecast.status === 'forecast') {
        <div><dt>Forecast final gravity (95 %)</dt>
          <dd data-testid="forecast-fg">{{ d.forecast.finalGravity | number: '1.3-3' }} ({{ d.forecast.finalGravityLow | number: '1.3-3' }}–{{ d.forecast.finalGravityHigh | number: '1.3-3' }})</dd></div>
        <div><dt>Forecast to finish</dt><dd data-testid="forecast-finish">{{ finish() }}</dd></div>
      }
    </dl>
    @if (d.forecast.status !== 'forecast') {
      <p role="status" data-testid="forecast-none">{{ d.forecast.message }}</p>
    } @else {
      <p class="hint">Forecast from a four-parameter logistic curve of apparent extract (Speers, Rogers and Smith, 2003) fitted to {{ d.forecast.readingsUsed }} readings; the band narrows as readings arrive.</p>
    }
  `,
  styles: `
    .figures { display: grid; grid-template-columns: repeat(auto-fill, minmax(200px, 1fr)); gap: 8px; margin: 0 0 8px; }
    .figures div { padding: 8px 12px; border-radius: 8px; background: var(--mat-sys-surface-container-low); }
    dt { font-size: 0.85rem; } dd { margin: 4px 0 0; font-weight: 600; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ForecastSummary {
  readonly data = input.required<FermentationChartData>();
  readonly timeZone = input('UTC');

  protected readonly finish = computed(() => {
    const f = this.data().forecast;
    if (f.status !== 'forecast') return '';
    const day = (ms: number) => DateTime.fromMillis(ms, { zone: this.timeZone() }).toFormat('d LLL');
    return `${day(f.finishTime)} (${day(f.finishTimeEarly)}–${day(f.finishTimeLate)})`;
  });
}
