import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { Role } from '@shared/auth';

/** A role shown as a small labelled badge. */
@Component({
  selector: 'cw-role-badge',
  template: '{{ role() }}',
  styleUrl: './role-badge.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[class]': '"cw-role-badge cw-role-" + role()' },
})
export class RoleBadge {
  readonly role = input.required<Role>();
}
