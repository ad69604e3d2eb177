import { ChangeDetectionStrategy, Component, inject, OnInit } from '@angular/core';
import { Store } from '@ngrx/store';
import { CreateInvitationRequest } from '@shared/members';
import { authFeature } from '@app/auth/state/auth.feature';
import { InvitationList } from '../invitation-list/invitation-list';
import { InviteForm } from '../invite-form/invite-form';
import { IssuedLinkPanel } from '../issued-link-panel/issued-link-panel';
import { ActiveChange, MemberTable, RolesChange } from '../member-table/member-table';
import { MembersPageActions } from '../state/members-page.actions';
import { membersFeature } from '../state/members.feature';

@Component({
  selector: 'cw-members-page',
  imports: [MemberTable, InviteForm, InvitationList, IssuedLinkPanel],
  templateUrl: './members-page.html',
  styleUrl: './members-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MembersPage implements OnInit {
  private readonly store = inject(Store);

  protected readonly members = this.store.selectSignal(membersFeature.selectAllMembers);
  protected readonly invitations = this.store.selectSignal(membersFeature.selectInvitations);
  protected readonly loading = this.store.selectSignal(membersFeature.selectLoading);
  protected readonly loadError = this.store.selectSignal(membersFeature.selectLoadError);
  protected readonly savingMemberIds = this.store.selectSignal(membersFeature.selectSavingMemberIds);
  protected readonly inviting = this.store.selectSignal(membersFeature.selectInviting);
  protected readonly inviteFieldErrors = this.store.selectSignal(membersFeature.selectInviteFieldErrors);
  protected readonly invitationsCreated = this.store.selectSignal(membersFeature.selectInvitationsCreated);
  protected readonly issuedLink = this.store.selectSignal(membersFeature.selectIssuedLink);
  protected readonly user = this.store.selectSignal(authFeature.selectUser);
  protected readonly coopTimeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);

  ngOnInit(): void {
    this.store.dispatch(MembersPageActions.opened());
  }

  protected changeRoles(change: RolesChange): void {
    this.store.dispatch(MembersPageActions.rolesChanged(change));
  }

  protected changeActive(change: ActiveChange): void {
    this.store.dispatch(MembersPageActions.activeChanged(change));
  }

  protected requestResetLink(memberId: number): void {
    this.store.dispatch(MembersPageActions.resetLinkRequested({ memberId }));
  }

  protected invite(request: CreateInvitationRequest): void {
    this.store.dispatch(MembersPageActions.invitationSubmitted({ request }));
  }

  protected revokeInvitation(invitationId: number): void {
    this.store.dispatch(MembersPageActions.invitationRevoked({ invitationId }));
  }

  protected linkCopied(copied: boolean): void {
    this.store.dispatch(MembersPageActions.issuedLinkCopied({ copied }));
  }

  protected dismissLink(): void {
    this.store.dispatch(MembersPageActions.issuedLinkDismissed());
  }
}
