import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { BATCH_STATUS_LABELS, BrewDayMeasurements, skippedStatuses, UpdateBatchRequest } from '@shared/batches';
import { BatchAnalysisLinks } from '../batch-analysis-links/batch-analysis-links';
import { BrewDayForm } from '../brew-day-form/brew-day-form';
import { ProgressSummary } from '../progress-summary/progress-summary';
import { ChosenMove, StatusFlow } from '../status-flow/status-flow';
import { BatchDetailsForm } from '../batch-details-form/batch-details-form';
import { BatchPageActions } from '../state/batch-page.actions';
import { selectBatchPageViewModel } from '../state/batches.selectors';
import { DrawDialogActions } from '@app/stock/state/draw-dialog.actions';
import { selectMayKeepStock } from '@app/stock/state/stock.selectors';

/** One batch: status and its dates, brew-day measurements beside the predictions, fermentation so far. */
@Component({
  selector: 'cw-batch-page',
  imports: [RouterLink, MatButton, MatIcon, StatusFlow, BatchDetailsForm, BrewDayForm, ProgressSummary, BatchAnalysisLinks],
  templateUrl: './batch-page.html',
  styleUrl: './batch-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BatchPage {
  private readonly store = inject(Store);
  readonly batchId = input.required<string>();

  protected readonly vm = this.store.selectSignal(selectBatchPageViewModel);
  protected readonly statusLabels = BATCH_STATUS_LABELS;
  protected readonly editingDetails = signal(false);
  protected readonly mayKeepStock = this.store.selectSignal(selectMayKeepStock);

  constructor() {
    effect(() => {
      const batchId = Number(this.batchId());
      untracked(() => this.store.dispatch(BatchPageActions.opened({ batchId })));
    });
    // A saved batch comes back as a new object: the details form closes on success and stays open on a refusal.
    const batch = computed(() => this.vm().batch);
    effect(() => {
      batch();
      untracked(() => this.editingDetails.set(false));
    });
  }

  protected move({ status, at }: ChosenMove): void {
    const batch = this.vm().batch;
    if (batch) this.store.dispatch(BatchPageActions.statusMoveChosen({ batchId: batch.id, status, skipped: skippedStatuses(batch.status, status), at }));
  }

  protected editDetails(): void {
    const batch = this.vm().batch;
    if (!batch) return;
    this.editingDetails.set(true);
    this.store.dispatch(BatchPageActions.detailsEditOpened({ batchId: batch.id }));
  }

  protected saveDetails(changes: UpdateBatchRequest): void {
    const batch = this.vm().batch;
    if (!batch) return;
    if (Object.keys(changes).length) this.store.dispatch(BatchPageActions.detailsSubmitted({ batchId: batch.id, changes }));
    else this.editingDetails.set(false);
  }

  protected drawFromStock(batchId: number): void {
    this.store.dispatch(DrawDialogActions.drawOffered({ batchId }));
  }

  protected saveBrewDay(measured: BrewDayMeasurements): void {
    const batch = this.vm().batch;
    if (batch) this.store.dispatch(BatchPageActions.brewDaySubmitted({ batchId: batch.id, measured }));
  }
}
