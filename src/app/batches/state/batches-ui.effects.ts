import { inject } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { Router } from '@angular/router';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { filter, map, switchMap, tap } from 'rxjs';
import { BATCH_STATUS_LABELS } from '@shared/batches';
import { Notifier } from '@app/core/notifier';
import { ConfirmDialog, ConfirmDialogData } from '@app/ui/confirm-dialog/confirm-dialog';
import { BatchPageActions } from './batch-page.actions';
import { BatchesApiActions } from './batches-api.actions';

/** Asks before a move that records no date for the steps it passes over. */
export const confirmSkip = createEffect(
  (actions$ = inject(Actions), dialog = inject(MatDialog)) =>
    actions$.pipe(
      ofType(BatchPageActions.statusMoveChosen),
      filter(({ skipped }) => skipped.length > 0),
      switchMap(({ batchId, status, skipped, at }) => {
        const names = skipped.map((s) => BATCH_STATUS_LABELS[s].toLowerCase()).join(' and ');
        const data: ConfirmDialogData = {
          title: `Skip ${names}?`,
          message: `Moving straight to ${BATCH_STATUS_LABELS[status].toLowerCase()} records no date for ${names}. Continue?`,
          confirmLabel: `Move to ${BATCH_STATUS_LABELS[status].toLowerCase()}`,
        };
        return dialog.open(ConfirmDialog, { data }).afterClosed().pipe(filter((yes) => yes === true), map(() => BatchPageActions.skipConfirmed({ batchId, status, at })));
      }),
    ),
  { functional: true },
);

export const openStartedBatch = createEffect(
  (actions$ = inject(Actions), router = inject(Router)) =>
    actions$.pipe(
      ofType(BatchesApiActions.batchStartedSuccess),
      tap(({ batch }) => void router.navigate(['/batches', batch.id])),
    ),
  { functional: true, dispatch: false },
);

export const showBatchMessages = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(BatchesApiActions.batchChangedSuccess, BatchesApiActions.batchChangedFailure, BatchesApiActions.editChoicesLoadedFailure, BatchesApiActions.batchStartedSuccess, BatchesApiActions.batchStartedFailure),
      tap((action) => notifier.notify(action.type === BatchesApiActions.batchStartedSuccess.type ? `Started ${action.batch.name}.` : action.message)),
    ),
  { functional: true, dispatch: false },
);
