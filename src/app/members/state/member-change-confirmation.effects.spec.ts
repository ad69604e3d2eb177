import { Actions } from '@ngrx/effects';
import { Action, Store } from '@ngrx/store';
import { firstValueFrom, isEmpty, of } from 'rxjs';
import { Invitation } from '@shared/members';
import { generateMockMember } from '@app/testing/member-mock';
import { authFeature } from '@app/auth/state/auth.feature';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { ConfirmQuestion } from '@app/ui/confirm-dialog/confirm-dialog';
import { Confirmation } from '@app/ui/confirmation';
import { MemberChangeConfirmationActions } from './member-change-confirmation.actions';
import { confirmActiveChange, confirmRevocation, confirmRolesChange } from './member-change-confirmation.effects';
import { membersFeature } from './members.feature';
import { MembersPageActions } from './members-page.actions';

const ada = generateMockMember({ id: 7, name: 'Ada Okafor', roles: ['member', 'admin'] });
const jonah = generateMockMember({ id: 9, name: 'Jonah Weiss', roles: ['member'] });
const hazelInvited: Invitation = { id: 3, email: 'hazel@example.org', roles: ['member'], invitedBy: 'Ada Okafor', createdAt: '2026-12-01T10:00:00Z', expiresAt: '2026-12-08T10:00:00Z' };
const actionsOf = (...actions: Action[]) => new Actions(of(...actions));

/** A store holding Ada (signed in), Jonah and an invitation for Hazel. */
const fakeStore = () =>
  ({
    select: (selector: unknown) =>
      of(
        selector === authFeature.selectUser
          ? generateMockSessionUser(['member', 'admin'], { id: ada.id })
          : selector === membersFeature.selectInvitations
            ? [hazelInvited]
            : { [ada.id]: ada, [jonah.id]: jonah },
      ),
  }) as unknown as Store;

function answering(answer: boolean) {
  const asked: ConfirmQuestion[] = [];
  const confirmation = { ask: (question: ConfirmQuestion) => (asked.push(question), of(answer)) } as unknown as Confirmation;
  return { asked, confirmation };
}

describe('member change confirmation effects', () => {
  it('asks before an admin removes her own admin role, warning that she loses access, and sends nothing on cancel', async () => {
    const { asked, confirmation } = answering(false);
    const change = MembersPageActions.rolesChanged({ memberId: ada.id, roles: ['member'] });

    const nothing = await firstValueFrom(confirmRolesChange(actionsOf(change), fakeStore(), confirmation).pipe(isEmpty()));

    expect(nothing).toBe(true);
    expect(asked[0]).toMatchObject({ title: 'Remove your own admin role?', lockout: true });
    expect(asked[0].message).toContain('You will lose access to the Members page');
  });

  it('passes the role change on once she says yes', async () => {
    const { confirmation } = answering(true);
    const change = MembersPageActions.rolesChanged({ memberId: ada.id, roles: ['member'] });

    const result = await firstValueFrom(confirmRolesChange(actionsOf(change), fakeStore(), confirmation));

    expect(result).toEqual(MemberChangeConfirmationActions.rolesChangeConfirmed({ memberId: ada.id, roles: ['member'] }));
  });

  it('gives a role without asking', async () => {
    const { asked, confirmation } = answering(false);
    const change = MembersPageActions.rolesChanged({ memberId: jonah.id, roles: ['member', 'brewer'] });

    const result = await firstValueFrom(confirmRolesChange(actionsOf(change), fakeStore(), confirmation));

    expect(asked).toEqual([]);
    expect(result).toEqual(MemberChangeConfirmationActions.rolesChangeConfirmed({ memberId: jonah.id, roles: ['member', 'brewer'] }));
  });

  it('asks before deactivating someone', async () => {
    const { asked, confirmation } = answering(true);

    await firstValueFrom(confirmActiveChange(actionsOf(MembersPageActions.activeChanged({ memberId: jonah.id, active: false })), fakeStore(), confirmation));

    expect(asked[0].title).toBe('Deactivate Jonah Weiss?');
  });

  it('asks before revoking an invitation, naming whom it was for and that it cannot be undone, and revokes nothing on cancel', async () => {
    const { asked, confirmation } = answering(false);
    const revoke = MembersPageActions.invitationRevoked({ invitationId: hazelInvited.id });

    const nothing = await firstValueFrom(confirmRevocation(actionsOf(revoke), fakeStore(), confirmation).pipe(isEmpty()));

    expect(nothing).toBe(true);
    expect(asked[0].title).toBe('Revoke the invitation for hazel@example.org?');
    expect(asked[0].message).toContain('cannot be undone');
  });
});
