import { HttpEventType } from '@angular/common/http';
import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, exhaustMap, filter, map, of } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { ReadingsClient } from '../readings-client';
import { GravityLogPageActions } from './gravity-log-page.actions';
import { ReadingsApiActions } from './readings-api.actions';

/** Sends the file, reporting how much is uploaded, then the server's answer. */
export const importFile = createEffect(
  (actions$ = inject(Actions), client = inject(ReadingsClient)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.fileSubmitted),
      exhaustMap(({ batchId, file, mode, dryRun, columns }) =>
        client.importFile(batchId, file, { mode, dryRun, columns }).pipe(
          filter((event) => event.type === HttpEventType.UploadProgress || event.type === HttpEventType.Response),
          map((event) =>
            event.type === HttpEventType.Response
              ? ReadingsApiActions.importFinished({ result: event.body! })
              : ReadingsApiActions.importProgressed({ percent: event.total ? Math.round((100 * event.loaded) / event.total) : 0 }),
          ),
          catchError((error: unknown) => of(ReadingsApiActions.importFailed({ message: apiErrorMessage(error, 'The file could not be imported.') }))),
        ),
      ),
    ),
  { functional: true },
);
