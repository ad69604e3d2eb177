import { ChangeDetectionStrategy, Component, effect, inject, input, untracked } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { BATCH_STATUS_LABELS, BatchStatus, BrewDayMeasurements, skippedStatuses } from '@shared/batches';
import { BatchAnalysisLinks } from '../batch-analysis-links/batch-analysis-links';
import { BrewDayForm } from '../brew-day-form/brew-day-form';
import { ProgressSummary } from '../progress-summary/progress-summary';
import { StatusFlow } from '../status-flow/status-flow';
import { BatchPageActions } from '../state/batch-page.actions';
import { selectBatchPageViewModel } from '../state/batches.selectors';

/** One batch: status and its dates, brew-day measurements beside the predictions, fermentation so far. */
@Component({
  selector: 'cw-batch-page',
  imports: [RouterLink, MatButton, MatIcon, StatusFlow, BrewDayForm, ProgressSummary, BatchAnalysisLinks],
  templateUrl: './batch-page.html',
  styleUrl: './batch-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BatchPage {
  private readonly store = inject(Store);
  readonly batchId = input.required<string>();

  protected readonly vm = this.store.selectSignal(selectBatchPageViewModel);
  protected readonly statusLabels = BATCH_STATUS_LABELS;

  constructor() {
    effect(() => {
      const batchId = Number(this.batchId());
      untracked(() => this.store.dispatch(BatchPageActions.opened({ batchId })));
    });
  }

  protected move(status: BatchStatus): void {
    const batch = this.vm().batch;
    if (batch) this.store.dispatch(BatchPageActions.statusMoveChosen({ batchId: batch.id, status, skipped: skippedStatuses(batch.status, status) }));
  }

  protected saveBrewDay(measured: BrewDayMeasurements): void {
    const batch = this.vm().batch;
    if (batch) this.store.dispatch(BatchPageActions.brewDaySubmitted({ batchId: batch.id, measured }));
  }
}
