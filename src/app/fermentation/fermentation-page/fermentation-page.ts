import { ChangeDetectionStrategy, Component, computed, inject, input, OnInit } from '@angular/core';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { ForecastSummary } from '../forecast-summary/forecast-summary';
import { GravityChart } from '../gravity-chart/gravity-chart';
import { FermentationPageActions } from '../state/fermentation-page.actions';
import { fermentationFeature } from '../state/fermentation.feature';

/** A batch's fermentation: gravity and temperature over time with the forecast, attenuation and ABV so far. */
@Component({
  selector: 'cw-fermentation-page',
  imports: [RouterLink, GravityChart, ForecastSummary],
  template: `
    <section class="cw-page">
      @if (chart(); as c) {
        <h1>Fermentation: {{ c.batchName }}</h1>
        <p><a [routerLink]="['/strength-check', 'batches', c.batchId]">Strength check of this batch</a></p>
        <cw-forecast-summary [data]="c" [timeZone]="timeZone()" />
        <cw-gravity-chart [readings]="c.readings" [forecast]="forecast()" [timeZone]="timeZone()" />
      } @else if (error(); as message) {
        <h1>Fermentation</h1>
        <p class="cw-form-error" role="alert">{{ message }}</p>
      } @else {
        <h1>Fermentation</h1>
        <p role="status">Loading the readings…</p>
      }
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FermentationPage implements OnInit {
  private readonly store = inject(Store);
  readonly batchId = input.required<string>();
  protected readonly chart = this.store.selectSignal(fermentationFeature.selectChart);
  protected readonly error = this.store.selectSignal(fermentationFeature.selectError);
  protected readonly timeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);
  protected readonly forecast = computed(() => { const f = this.chart()?.forecast; return f?.status === 'forecast' ? f : null; });

  ngOnInit(): void {
    this.store.dispatch(FermentationPageActions.opened({ batchId: Number(this.batchId()) }));
  }
}
