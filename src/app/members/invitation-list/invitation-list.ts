import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { Invitation } from '@shared/members';
import { RoleBadge } from '@app/ui/role-badge/role-badge';

/** Invitations not yet accepted, each with a Revoke button. */
@Component({
  selector: 'cw-invitation-list',
  imports: [MatButton, RoleBadge, ZonedDateTimePipe],
  templateUrl: './invitation-list.html',
  styleUrl: './invitation-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InvitationList {
  readonly invitations = input.required<readonly Invitation[]>();
  readonly timeZone = input.required<string>();
  readonly revoked = output<number>();
}
