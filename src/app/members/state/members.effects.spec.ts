import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { Action } from '@ngrx/store';
import { firstValueFrom, Observable, of, throwError } from 'rxjs';
import { generateMockInvitation, generateMockMember } from '@app/testing/member-mock';
import { MembersClient } from '../members-client';
import { MembersApiActions } from './members-api.actions';
import { MemberChangeConfirmationActions } from './member-change-confirmation.actions';
import { MembersPageActions } from './members-page.actions';
import { createInvitation, loadMembers, updateMember } from './members.effects';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const fakeClient = (overrides: Partial<Record<keyof MembersClient, (...args: never[]) => Observable<unknown>>>) =>
  overrides as unknown as MembersClient;

describe('members effects', () => {
  it('loadMembers maps the list to Members Loaded Success when the page opens', async () => {
    const response = { members: [generateMockMember()], invitations: [] };
    const client = fakeClient({ list: () => of(response) });

    const result = await firstValueFrom(loadMembers(actionsOf(MembersPageActions.opened()), client));

    expect(result).toEqual(MembersApiActions.membersLoadedSuccess({ response }));
  });

  it('updateMember sends only the roles for a role change', async () => {
    const member = generateMockMember({ roles: ['member', 'brewer'] });
    const update = jest.fn(() => of(member));

    const result = await firstValueFrom(
      updateMember(actionsOf(MemberChangeConfirmationActions.rolesChangeConfirmed({ memberId: member.id, roles: ['member', 'brewer'] })), fakeClient({ update })),
    );

    expect(update).toHaveBeenCalledWith(member.id, { roles: ['member', 'brewer'] });
    expect(result).toEqual(MembersApiActions.memberUpdatedSuccess({ member }));
  });

  it('updateMember passes on the server message when the last admin would be removed (409)', async () => {
    const refusal = new HttpErrorResponse({
      status: 409,
      error: { error: { code: 'last-admin', message: 'The co-op needs at least one active admin.' } },
    });
    const client = fakeClient({ update: () => throwError(() => refusal) });

    const result = await firstValueFrom(
      updateMember(actionsOf(MemberChangeConfirmationActions.activeChangeConfirmed({ memberId: 22, active: false })), client),
    );

    expect(result).toEqual(
      MembersApiActions.memberUpdatedFailure({ memberId: 22, message: 'The co-op needs at least one active admin.' }),
    );
  });

  it('createInvitation maps the created invitation to Invitation Created Success', async () => {
    const invitation = generateMockInvitation({ link: 'https://coop.example/invitations/tok' });
    const invite = jest.fn(() => of(invitation));
    const request = { email: invitation.email, roles: invitation.roles };

    const result = await firstValueFrom(
      createInvitation(actionsOf(MembersPageActions.invitationSubmitted({ request })), fakeClient({ invite })),
    );

    expect(invite).toHaveBeenCalledWith(request);
    expect(result).toEqual(MembersApiActions.invitationCreatedSuccess({ invitation }));
  });
});
