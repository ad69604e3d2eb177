import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { Store } from '@ngrx/store';
import { exhaustMap, filter, map, Observable, of, withLatestFrom } from 'rxjs';
import { authFeature } from '@app/auth/state/auth.feature';
import { ConfirmQuestion } from '@app/ui/confirm-dialog/confirm-dialog';
import { Confirmation } from '@app/ui/confirmation';
import { MemberChangeConfirmationActions } from './member-change-confirmation.actions';
import { activeChangeQuestion, revocationQuestion, rolesChangeQuestion } from './member-change-questions';
import { MembersPageActions } from './members-page.actions';
import { membersFeature } from './members.feature';

/** Passes the action on at once when there is nothing to ask, else only after the person said yes. */
function askFirst<A>(confirmation: Confirmation, question: ConfirmQuestion | null, confirmed: A): Observable<A> {
  return question ? confirmation.ask(question).pipe(filter(Boolean), map(() => confirmed)) : of(confirmed);
}

export const confirmRolesChange = createEffect(
  (actions$ = inject(Actions), store = inject(Store), confirmation = inject(Confirmation)) =>
    actions$.pipe(
      ofType(MembersPageActions.rolesChanged),
      withLatestFrom(store.select(membersFeature.selectEntities), store.select(authFeature.selectUser)),
      exhaustMap(([{ memberId, roles }, members, user]) => {
        const member = members[memberId];
        const question = member ? rolesChangeQuestion(member, roles, user?.id ?? null) : null;
        return askFirst(confirmation, question, MemberChangeConfirmationActions.rolesChangeConfirmed({ memberId, roles }));
      }),
    ),
  { functional: true },
);

export const confirmActiveChange = createEffect(
  (actions$ = inject(Actions), store = inject(Store), confirmation = inject(Confirmation)) =>
    actions$.pipe(
      ofType(MembersPageActions.activeChanged),
      withLatestFrom(store.select(membersFeature.selectEntities), store.select(authFeature.selectUser)),
      exhaustMap(([{ memberId, active }, members, user]) => {
        const member = members[memberId];
        const question = member ? activeChangeQuestion(member, active, user?.id ?? null) : null;
        return askFirst(confirmation, question, MemberChangeConfirmationActions.activeChangeConfirmed({ memberId, active }));
      }),
    ),
  { functional: true },
);

export const confirmRevocation = createEffect(
  (actions$ = inject(Actions), store = inject(Store), confirmation = inject(Confirmation)) =>
    actions$.pipe(
      ofType(MembersPageActions.invitationRevoked),
      withLatestFrom(store.select(membersFeature.selectInvitations)),
      exhaustMap(([{ invitationId }, invitations]) => {
        const question = revocationQuestion(invitations.find((each) => each.id === invitationId));
        return askFirst(confirmation, question, MemberChangeConfirmationActions.revocationConfirmed({ invitationId }));
      }),
    ),
  { functional: true },
);
