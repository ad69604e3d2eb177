import { inject } from '@angular/core';
import { CanDeactivateFn } from '@angular/router';
import { Store } from '@ngrx/store';
import { Observable, of } from 'rxjs';
import { Confirmation } from '@app/ui/confirmation';
import { unsavedEditsFeature } from './state/unsaved-edits.feature';

/** Asks before the editor is left while it holds edits that are not saved. */
export const unsavedEditsGuard: CanDeactivateFn<unknown> = (): Observable<boolean> => {
  const unsaved = inject(Store).selectSignal(unsavedEditsFeature.selectUnsaved)();
  if (!unsaved) return of(true);
  return inject(Confirmation).ask({
    title: 'Leave without saving?',
    message: 'Your changes to this recipe are not saved as a version yet. Leaving now discards them.',
    confirmLabel: 'Discard changes',
  });
};
