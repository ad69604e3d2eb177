import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { generateMockInvitation, generateMockMember } from '@app/testing/member-mock';
import { MembersApiActions } from './members-api.actions';
import { MemberChangeConfirmationActions } from './member-change-confirmation.actions';
import { MembersPageActions } from './members-page.actions';
import { initialMembersState, membersAdapter, membersFeature, MembersState } from './members.feature';

const { reducer } = membersFeature;
const jonah = generateMockMember();
const ada = generateMockMember({ id: 22, name: 'Ada Okafor', email: 'ada.okafor@fernhollow.example', roles: ['member', 'admin'] });
const loaded = (): MembersState => membersAdapter.setAll([jonah, ada], { ...initialMembersState });

describe('membersFeature reducer', () => {
  it('stores members sorted by name and the pending invitations when the list arrives', () => {
    const invitation = generateMockInvitation();

    const state = reducer(
      { ...initialMembersState, loading: true },
      MembersApiActions.membersLoadedSuccess({ response: { members: [jonah, ada], invitations: [invitation] } }),
    );

    expect(membersFeature.selectAllMembers({ members: state }).map((m) => m.name)).toEqual(['Ada Okafor', 'Jonah Weiss']);
    expect(state.invitations).toEqual([invitation]);
    expect(state.loading).toBe(false);
  });

  it('marks a member as saving while a role change is on its way, and replaces them when it is saved', () => {
    const saving = reducer(loaded(), MemberChangeConfirmationActions.rolesChangeConfirmed({ memberId: jonah.id, roles: ['member', 'brewer'] }));
    expect(saving.savingMemberIds).toEqual([jonah.id]);

    const saved = reducer(saving, MembersApiActions.memberUpdatedSuccess({ member: { ...jonah, roles: ['member', 'brewer'] } }));

    expect(saved.savingMemberIds).toEqual([]);
    expect(saved.entities[jonah.id]?.roles).toEqual(['member', 'brewer']);
  });

  it('keeps the member unchanged and stops saving when the server refuses (last admin)', () => {
    const saving = reducer(loaded(), MemberChangeConfirmationActions.activeChangeConfirmed({ memberId: ada.id, active: false }));

    const state = reducer(saving, MembersApiActions.memberUpdatedFailure({ memberId: ada.id, message: 'Last admin.' }));

    expect(state.savingMemberIds).toEqual([]);
    expect(state.entities[ada.id]).toEqual(ada);
  });

  it('adds a created invitation without its link and shows the link once', () => {
    const invitation = generateMockInvitation({ link: 'https://coop.example/invitations/tok' });

    const state = reducer(
      { ...loaded(), inviting: true },
      MembersApiActions.invitationCreatedSuccess({ invitation }),
    );

    expect(state.invitations).toEqual([generateMockInvitation()]);
    expect(state.issuedLink).toEqual({
      kind: 'invitation',
      email: invitation.email,
      link: 'https://coop.example/invitations/tok',
      expiresAt: invitation.expiresAt,
    });
    expect(state).toMatchObject({ inviting: false, invitationsCreated: 1 });
  });

  it('shows an issued reset link with the member e-mail', () => {
    const reset = { link: 'https://coop.example/reset-password/abc', expiresAt: '2026-12-02T10:00:00Z' };

    const state = reducer(loaded(), MembersApiActions.resetLinkIssuedSuccess({ memberId: jonah.id, reset }));

    expect(state.issuedLink).toEqual({ kind: 'password-reset', email: jonah.email, ...reset });
  });

  it('removes a revoked invitation and hides a dismissed link', () => {
    const withInvitation: MembersState = {
      ...loaded(),
      invitations: [generateMockInvitation()],
      issuedLink: { kind: 'invitation', email: 'x@y.example', link: 'l', expiresAt: 'e' },
    };

    const revoked = reducer(withInvitation, MembersApiActions.invitationRevokedSuccess({ invitationId: 31 }));
    const dismissed = reducer(revoked, MembersPageActions.issuedLinkDismissed());

    expect(revoked.invitations).toEqual([]);
    expect(dismissed.issuedLink).toBeNull();
  });

  it('forgets everything on sign-out', () => {
    expect(reducer(loaded(), AuthApiActions.signOutSuccess())).toEqual(initialMembersState);
  });
});
