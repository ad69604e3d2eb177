import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { ActionCreator } from '@ngrx/store';
import { catchError, EMPTY, map, switchMap } from 'rxjs';
import { StockClient } from '../stock-client';
import { StockApiActions } from './stock-api.actions';

/** An effect loading the person's unit system when one of `triggers` happens; on failure amounts stay metric. */
export function loadUnitsOn(...triggers: ActionCreator[]) {
  return createEffect(
    (actions$ = inject(Actions), client = inject(StockClient)) =>
      actions$.pipe(
        ofType(...triggers),
        switchMap(() => client.preferences().pipe(map(({ unitSystem }) => StockApiActions.unitsLoadedSuccess({ unitSystem })), catchError(() => EMPTY))),
      ),
    { functional: true },
  );
}
