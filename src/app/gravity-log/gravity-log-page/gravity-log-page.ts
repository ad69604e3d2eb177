import { ChangeDetectionStrategy, Component, effect, inject, input, untracked } from '@angular/core';
import { MatAnchor } from '@angular/material/button';
import { MatExpansionPanel, MatExpansionPanelHeader, MatExpansionPanelTitle } from '@angular/material/expansion';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { CorrectionFactorRequest } from '@shared/batches';
import { GravityReading, PushTokenSummary, ReadingInput, ReadingSortColumn } from '@shared/readings';
import { BatchAnalysisLinks } from '@app/batches/batch-analysis-links/batch-analysis-links';
import { ProgressSummary } from '@app/batches/progress-summary/progress-summary';
import { CorrectionFactorPanel } from '../correction-factor-panel/correction-factor-panel';
import { PushTokensPanel } from '../push-tokens-panel/push-tokens-panel';
import { ReadingForm } from '../reading-form/reading-form';
import { ReadingUpload, ReadingUploadRequest } from '../reading-upload/reading-upload';
import { ReadingsClient } from '../readings-client';
import { ReadingsTable } from '../readings-table/readings-table';
import { GravityLogPageActions } from '../state/gravity-log-page.actions';
import { selectGravityLogViewModel } from '../state/gravity-log.selectors';

/** The readings of one batch: entry form, table, file upload and export, logger push tokens. */
@Component({
  selector: 'cw-gravity-log-page',
  imports: [
    BatchAnalysisLinks,
    RouterLink, MatAnchor, MatIcon, MatExpansionPanel, MatExpansionPanelHeader, MatExpansionPanelTitle,
    ProgressSummary, ReadingForm, ReadingsTable, ReadingUpload, PushTokensPanel, CorrectionFactorPanel,
  ],
  templateUrl: './gravity-log-page.html',
  styleUrl: './gravity-log-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class GravityLogPage {
  private readonly store = inject(Store);
  private readonly client = inject(ReadingsClient);
  readonly batchId = input.required<string>();

  protected readonly vm = this.store.selectSignal(selectGravityLogViewModel);

  constructor() {
    effect(() => {
      const batchId = Number(this.batchId());
      untracked(() => this.store.dispatch(GravityLogPageActions.opened({ batchId })));
    });
  }

  protected exportUrl(): string {
    return this.client.exportUrl(Number(this.batchId()));
  }

  protected log(input: ReadingInput): void {
    this.store.dispatch(GravityLogPageActions.readingSubmitted({ batchId: Number(this.batchId()), input }));
  }

  protected changePage(page: { pageIndex: number; pageSize: number }): void {
    this.store.dispatch(GravityLogPageActions.pageChanged(page));
  }

  protected changeSort(sort: { sort: ReadingSortColumn; direction: 'asc' | 'desc' }): void {
    this.store.dispatch(GravityLogPageActions.sortChanged(sort));
  }

  protected editReading(reading: GravityReading): void {
    this.store.dispatch(GravityLogPageActions.readingEditChosen({ reading }));
  }

  protected deleteReading(reading: GravityReading): void {
    this.store.dispatch(GravityLogPageActions.readingDeleteChosen({ reading }));
  }

  protected upload(request: ReadingUploadRequest): void {
    this.store.dispatch(GravityLogPageActions.fileSubmitted({ batchId: Number(this.batchId()), ...request }));
  }

  protected setFactor(request: CorrectionFactorRequest): void {
    this.store.dispatch(GravityLogPageActions.correctionFactorSubmitted({ batchId: Number(this.batchId()), request }));
  }

  protected makeToken(label: string): void {
    this.store.dispatch(GravityLogPageActions.pushTokenRequested({ batchId: Number(this.batchId()), label }));
  }

  protected revokeToken(token: PushTokenSummary): void {
    this.store.dispatch(GravityLogPageActions.pushTokenRevokeChosen({ batchId: Number(this.batchId()), tokenId: token.id, label: token.label }));
  }
}
