import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatIconButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatMenu, MatMenuItem, MatMenuTrigger } from '@angular/material/menu';
import { RouterLink } from '@angular/router';
import { SessionUser } from '@shared/auth';
import { RoleBadge } from '@app/ui/role-badge/role-badge';

/** The signed-in person's name and roles, with their profile and the Sign out item. */
@Component({
  selector: 'cw-user-menu',
  imports: [MatIconButton, MatIcon, MatMenu, MatMenuItem, MatMenuTrigger, RoleBadge, RouterLink],
  templateUrl: './user-menu.html',
  styleUrl: './user-menu.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UserMenu {
  readonly user = input.required<SessionUser>();
  readonly signOutChosen = output<void>();
}
