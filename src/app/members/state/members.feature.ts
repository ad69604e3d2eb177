import { createEntityAdapter, EntityState } from '@ngrx/entity';
import { createFeature, createReducer, createSelector, on } from '@ngrx/store';
import { Invitation, Member } from '@shared/members';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { FieldErrors } from '@app/ui/server-field-errors';
import { MemberChangeConfirmationActions } from './member-change-confirmation.actions';
import { MembersApiActions } from './members-api.actions';
import { MembersPageActions } from './members-page.actions';

/** A one-time link just handed out by the server, shown to the admin until dismissed. */
export interface IssuedLink {
  kind: 'invitation' | 'password-reset';
  email: string;
  link: string;
  expiresAt: string;
}

export interface MembersState extends EntityState<Member> {
  /** Pending invitations; links are never kept here. */
  invitations: Invitation[];
  loading: boolean;
  loadError: string | null;
  /** Members with a change on its way to the server. */
  savingMemberIds: number[];
  inviting: boolean;
  /** Reasons per field from a 400 answer to the invite form. */
  inviteFieldErrors: FieldErrors | null;
  /** Counts created invitations so the invite form can clear itself after each one. */
  invitationsCreated: number;
  issuedLink: IssuedLink | null;
}

export const membersAdapter = createEntityAdapter<Member>({
  sortComparer: (a, b) => a.name.localeCompare(b.name),
});

export const initialMembersState: MembersState = membersAdapter.getInitialState({
  invitations: [],
  loading: false,
  loadError: null,
  savingMemberIds: [],
  inviting: false,
  inviteFieldErrors: null,
  invitationsCreated: 0,
  issuedLink: null,
});

const withoutId = (ids: number[], id: number) => ids.filter((each) => each !== id);

export const membersFeature = createFeature({
  name: 'members',
  reducer: createReducer(
    initialMembersState,
    on(MembersPageActions.opened, (state): MembersState => ({ ...state, loading: true, loadError: null })),
    on(MembersApiActions.membersLoadedSuccess, (state, { response }): MembersState =>
      membersAdapter.setAll(response.members, {
        ...state,
        invitations: response.invitations,
        loading: false,
      }),
    ),
    on(MembersApiActions.membersLoadedFailure, (state, { message }): MembersState => ({
      ...state,
      loading: false,
      loadError: message,
    })),
    on(
      MemberChangeConfirmationActions.rolesChangeConfirmed,
      MemberChangeConfirmationActions.activeChangeConfirmed,
      MembersPageActions.resetLinkRequested,
      (state, { memberId }): MembersState => ({
        ...state,
        savingMemberIds: [...withoutId(state.savingMemberIds, memberId), memberId],
      }),
    ),
    on(MembersApiActions.memberUpdatedSuccess, (state, { member }): MembersState =>
      membersAdapter.setOne(member, { ...state, savingMemberIds: withoutId(state.savingMemberIds, member.id) }),
    ),
    on(
      MembersApiActions.memberUpdatedFailure,
      MembersApiActions.resetLinkIssuedFailure,
      (state, { memberId }): MembersState => ({ ...state, savingMemberIds: withoutId(state.savingMemberIds, memberId) }),
    ),
    on(MembersApiActions.resetLinkIssuedSuccess, (state, { memberId, reset }): MembersState => ({
      ...state,
      savingMemberIds: withoutId(state.savingMemberIds, memberId),
      issuedLink: { kind: 'password-reset', email: state.entities[memberId]?.email ?? '', ...reset },
    })),
    on(MembersPageActions.invitationSubmitted, (state): MembersState => ({ ...state, inviting: true, inviteFieldErrors: null })),
    on(MembersApiActions.invitationCreatedSuccess, (state, { invitation }): MembersState => {
      const { link, ...pending } = invitation;
      return {
        ...state,
        inviting: false,
        invitationsCreated: state.invitationsCreated + 1,
        invitations: [...state.invitations.filter((each) => each.id !== pending.id), pending],
        issuedLink: link
          ? { kind: 'invitation', email: invitation.email, link, expiresAt: invitation.expiresAt }
          : state.issuedLink,
      };
    }),
    on(MembersApiActions.invitationCreatedFailure, (state, { fields }): MembersState => ({
      ...state,
      inviting: false,
      inviteFieldErrors: fields,
    })),
    on(MembersApiActions.invitationRevokedSuccess, (state, { invitationId }): MembersState => ({
      ...state,
      invitations: state.invitations.filter((each) => each.id !== invitationId),
    })),
    on(MembersPageActions.issuedLinkDismissed, (state): MembersState => ({ ...state, issuedLink: null })),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (): MembersState => initialMembersState),
  ),
  extraSelectors: ({ selectMembersState }) => {
    const { selectAll } = membersAdapter.getSelectors();
    return {
      selectAllMembers: createSelector(selectMembersState, selectAll),
    };
  },
});
