import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { tap } from 'rxjs';
import { Notifier } from '@app/core/notifier';
import { MembersApiActions } from './members-api.actions';
import { MembersPageActions } from './members-page.actions';

const NOTICE_DURATION_MS = 6000;

export const showSuccess = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(
        MembersApiActions.memberUpdatedSuccess,
        MembersApiActions.invitationCreatedSuccess,
        MembersApiActions.invitationRevokedSuccess,
        MembersPageActions.issuedLinkCopied,
      ),
      tap((action) => notifier.notify(successMessage(action), NOTICE_DURATION_MS)),
    ),
  { functional: true, dispatch: false },
);

function successMessage(
  action:
    | ReturnType<typeof MembersApiActions.memberUpdatedSuccess>
    | ReturnType<typeof MembersApiActions.invitationCreatedSuccess>
    | ReturnType<typeof MembersApiActions.invitationRevokedSuccess>
    | ReturnType<typeof MembersPageActions.issuedLinkCopied>,
): string {
  switch (action.type) {
    case MembersApiActions.memberUpdatedSuccess.type:
      return `Saved the changes to ${action.member.name}.`;
    case MembersApiActions.invitationCreatedSuccess.type:
      return `Invitation for ${action.invitation.email} created.`;
    case MembersApiActions.invitationRevokedSuccess.type:
      return 'Invitation revoked.';
    default:
      return action.copied ? 'Link copied.' : 'The link could not be copied; select it and copy it by hand.';
  }
}

export const showFailure = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(
        MembersApiActions.membersLoadedFailure,
        MembersApiActions.memberUpdatedFailure,
        MembersApiActions.resetLinkIssuedFailure,
        MembersApiActions.invitationCreatedFailure,
        MembersApiActions.invitationRevokedFailure,
      ),
      tap(({ message }) => notifier.notify(message, NOTICE_DURATION_MS)),
    ),
  { functional: true, dispatch: false },
);
