import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { Invitation } from '@shared/members';
import { RoleBadge } from '@app/ui/role-badge/role-badge';

/** Invitations not yet accepted, each with a Revoke button. */
@Component({
  selector: 'cw-invitation-list',
  imports: [MatButton, RoleBadge, DatePipe],
  templateUrl: './invitation-list.html',
  styleUrl: './invitation-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InvitationList {
  readonly invitations = input.required<readonly Invitation[]>();
  readonly revoked = output<number>();
}
