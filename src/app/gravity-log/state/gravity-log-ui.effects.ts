import { inject } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { filter, map, switchMap, tap } from 'rxjs';
import { GravityReading, INSTRUMENT_LABELS, ReadingChangesRequest, UNIT_LABELS } from '@shared/readings';
import { ReadingEditDialog } from '../reading-edit-dialog/reading-edit-dialog';
import { Notifier } from '@app/core/notifier';
import { ConfirmDialog, ConfirmDialogData } from '@app/ui/confirm-dialog/confirm-dialog';
import { GravityLogPageActions } from './gravity-log-page.actions';
import { ReadingsApiActions } from './readings-api.actions';

function ask(dialog: MatDialog, data: ConfirmDialogData) {
  return dialog.open(ConfirmDialog, { data }).afterClosed().pipe(filter((yes) => yes === true));
}

/** A deletion cannot be undone from the page (the audit log keeps the reading): ask first. */
export const confirmReadingDelete = createEffect(
  (actions$ = inject(Actions), dialog = inject(MatDialog)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.readingDeleteChosen),
      switchMap(({ reading }) =>
        ask(dialog, {
          title: 'Delete this reading?',
          message: `${INSTRUMENT_LABELS[reading.instrument]} ${reading.rawValue} ${UNIT_LABELS[reading.rawUnit]} leaves the log. The audit log keeps a record of it.`,
          confirmLabel: 'Delete reading',
        }).pipe(map(() => GravityLogPageActions.readingDeleteConfirmed({ readingId: reading.id }))),
      ),
    ),
  { functional: true },
);

/** The correction of a reading's temperatures or note happens in a dialog; nothing is sent when nothing changed. */
export const openReadingEdit = createEffect(
  (actions$ = inject(Actions), dialog = inject(MatDialog)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.readingEditChosen),
      switchMap(({ reading }) =>
        dialog.open<ReadingEditDialog, GravityReading, ReadingChangesRequest | null>(ReadingEditDialog, { data: reading }).afterClosed().pipe(
          filter((changes): changes is ReadingChangesRequest => !!changes),
          map((changes) => GravityLogPageActions.readingEditSubmitted({ readingId: reading.id, changes })),
        ),
      ),
    ),
  { functional: true },
);

/** A revoked token locks its logger out for good: ask first. */
export const confirmTokenRevoke = createEffect(
  (actions$ = inject(Actions), dialog = inject(MatDialog)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.pushTokenRevokeChosen),
      switchMap(({ batchId, tokenId, label }) =>
        ask(dialog, {
          title: `Revoke “${label}”?`,
          message: 'The logger using this token can no longer send readings. This cannot be undone; make a new token to let it push again.',
          confirmLabel: 'Revoke token',
        }).pipe(map(() => GravityLogPageActions.pushTokenRevokeConfirmed({ batchId, tokenId }))),
      ),
    ),
  { functional: true },
);

export const showLogMessages = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(
        ReadingsApiActions.readingAddedSuccess, ReadingsApiActions.readingAddedFailure, ReadingsApiActions.readingDeletedSuccess, ReadingsApiActions.readingDeletedFailure,
        ReadingsApiActions.readingEditedSuccess, ReadingsApiActions.readingEditedFailure,
        ReadingsApiActions.correctionFactorSetSuccess, ReadingsApiActions.correctionFactorSetFailure, ReadingsApiActions.pushTokenCreatedFailure,
        ReadingsApiActions.pushTokenRevokedSuccess, ReadingsApiActions.pushTokenRevokedFailure,
      ),
      map((action) => {
        switch (action.type) {
          case ReadingsApiActions.readingAddedSuccess.type:
            return `Reading saved: SG ${action.reading.correctedSg.toFixed(4)} (20/20 °C).`;
          case ReadingsApiActions.readingEditedSuccess.type:
            return `Reading corrected: SG ${action.reading.correctedSg.toFixed(4)} (20/20 °C).`;
          case ReadingsApiActions.readingDeletedSuccess.type:
            return 'Reading deleted.';
          case ReadingsApiActions.correctionFactorSetSuccess.type:
            return `Wort correction factor set to ${action.batch.wortCorrectionFactor.toFixed(3)}; refractometer readings recomputed.`;
          case ReadingsApiActions.pushTokenRevokedSuccess.type:
            return 'Push token revoked.';
          default:
            return action.message;
        }
      }),
      tap((message) => notifier.notify(message)),
    ),
  { functional: true, dispatch: false },
);
