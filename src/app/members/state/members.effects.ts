import { HttpErrorResponse } from '@angular/common/http';
import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, exhaustMap, map, mergeMap, of, switchMap } from 'rxjs';
import { apiErrorBody, apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { MembersClient } from '../members-client';
import { MemberChangeConfirmationActions } from './member-change-confirmation.actions';
import { MembersApiActions } from './members-api.actions';
import { MembersPageActions } from './members-page.actions';

/** The server's refusal in words; the last-admin rule gets a plain fallback of its own. */
function failureMessage(error: unknown, fallback: string): string {
  if (apiErrorBody(error)?.error.code === 'last-admin') {
    return apiErrorMessage(error, 'The co-op must keep at least one active admin.');
  }
  if (error instanceof HttpErrorResponse && error.status === 403) {
    return apiErrorMessage(error, 'You are not allowed to do that.');
  }
  return apiErrorMessage(error, fallback);
}

export const loadMembers = createEffect(
  (actions$ = inject(Actions), client = inject(MembersClient)) =>
    actions$.pipe(
      ofType(MembersPageActions.opened),
      switchMap(() =>
        client.list().pipe(
          map((response) => MembersApiActions.membersLoadedSuccess({ response })),
          catchError((error: unknown) =>
            of(MembersApiActions.membersLoadedFailure({ message: failureMessage(error, 'The members could not be loaded.') })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const updateMember = createEffect(
  (actions$ = inject(Actions), client = inject(MembersClient)) =>
    actions$.pipe(
      ofType(MemberChangeConfirmationActions.rolesChangeConfirmed, MemberChangeConfirmationActions.activeChangeConfirmed),
      mergeMap((action) => {
        const request = 'roles' in action ? { roles: action.roles } : { active: action.active };
        return client.update(action.memberId, request).pipe(
          map((member) => MembersApiActions.memberUpdatedSuccess({ member })),
          catchError((error: unknown) =>
            of(
              MembersApiActions.memberUpdatedFailure({
                memberId: action.memberId,
                message: failureMessage(error, 'The change could not be saved.'),
              }),
            ),
          ),
        );
      }),
    ),
  { functional: true },
);

export const issueResetLink = createEffect(
  (actions$ = inject(Actions), client = inject(MembersClient)) =>
    actions$.pipe(
      ofType(MembersPageActions.resetLinkRequested),
      mergeMap(({ memberId }) =>
        client.issuePasswordReset(memberId).pipe(
          map((reset) => MembersApiActions.resetLinkIssuedSuccess({ memberId, reset })),
          catchError((error: unknown) =>
            of(
              MembersApiActions.resetLinkIssuedFailure({
                memberId,
                message: failureMessage(error, 'The reset link could not be issued.'),
              }),
            ),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const createInvitation = createEffect(
  (actions$ = inject(Actions), client = inject(MembersClient)) =>
    actions$.pipe(
      ofType(MembersPageActions.invitationSubmitted),
      exhaustMap(({ request }) =>
        client.invite(request).pipe(
          map((invitation) => MembersApiActions.invitationCreatedSuccess({ invitation })),
          catchError((error: unknown) =>
            of(
              MembersApiActions.invitationCreatedFailure({
                message: failureMessage(error, 'The invitation could not be created.'),
                fields: apiFieldErrors(error),
              }),
            ),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const revokeInvitation = createEffect(
  (actions$ = inject(Actions), client = inject(MembersClient)) =>
    actions$.pipe(
      ofType(MemberChangeConfirmationActions.revocationConfirmed),
      mergeMap(({ invitationId }) =>
        client.revokeInvitation(invitationId).pipe(
          map(() => MembersApiActions.invitationRevokedSuccess({ invitationId })),
          catchError((error: unknown) =>
            of(MembersApiActions.invitationRevokedFailure({ message: failureMessage(error, 'The invitation could not be revoked.') })),
          ),
        ),
      ),
    ),
  { functional: true },
);
