import { inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, concatMap, map, of, switchMap, tap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { LabClient } from '../lab-client';
import { LabApiActions } from './lab-api.actions';
import { BatchStrengthPageActions } from './batch-strength-page.actions';
import { StrengthCheckPageActions } from './strength-check-page.actions';

export const loadToleranceClasses = createEffect(
  (actions$ = inject(Actions), client = inject(LabClient)) =>
    actions$.pipe(
      ofType(StrengthCheckPageActions.opened, BatchStrengthPageActions.opened),
      switchMap(() =>
        client.toleranceClasses().pipe(
          map((toleranceClasses) => LabApiActions.toleranceClassesLoadedSuccess({ toleranceClasses })),
          catchError((error: unknown) => of(LabApiActions.toleranceClassesLoadedFailure({ message: apiErrorMessage(error, 'The product classes could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const saveToleranceClass = createEffect(
  (actions$ = inject(Actions), client = inject(LabClient)) =>
    actions$.pipe(
      ofType(StrengthCheckPageActions.toleranceClassAdded, StrengthCheckPageActions.toleranceClassChanged),
      concatMap((action) =>
        ('id' in action ? client.changeToleranceClass(action.id, action.input) : client.addToleranceClass(action.input)).pipe(
          map((toleranceClass) => LabApiActions.toleranceClassSavedSuccess({ toleranceClass })),
          catchError((error: unknown) => of(LabApiActions.toleranceClassSavedFailure({ message: apiErrorMessage(error, 'The product class could not be saved.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const showLabFeedback = createEffect(
  (actions$ = inject(Actions), snackBar = inject(MatSnackBar)) =>
    actions$.pipe(
      ofType(LabApiActions.toleranceClassSavedSuccess, LabApiActions.toleranceClassSavedFailure, LabApiActions.toleranceClassesLoadedFailure),
      map((action) => ('toleranceClass' in action ? `Saved the product class ${action.toleranceClass.name}.` : action.message)),
      tap((message) => snackBar.open(message, 'Dismiss', { duration: 5000 })),
    ),
  { functional: true, dispatch: false },
);
