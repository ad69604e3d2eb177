import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';
import { ChangeDetectionStrategy, Component, computed, input, model, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { Role, ROLES } from '@shared/auth';
import { Member } from '@shared/members';
import { SortHeader } from '@app/ui/sort-header/sort-header';
import { sortRows, TableSort } from '@app/ui/table-sort/table-sort';

/** A role change asked for on one member. */
export interface RolesChange {
  memberId: number;
  roles: Role[];
}

/** A deactivation or reactivation asked for on one member. */
export interface ActiveChange {
  memberId: number;
  active: boolean;
}

export type MemberColumn = 'name' | 'email' | 'state';

const SORTABLE: { key: MemberColumn; label: string }[] = [
  { key: 'name', label: 'Name' },
  { key: 'email', label: 'E-mail' },
];

const valueOf = (member: Member, column: string): string =>
  column === 'email' ? member.email : column === 'state' ? String(member.active) : member.name;

/** The people of the co-op with their roles, state and the officer's actions on them. */
@Component({
  selector: 'cw-member-table',
  imports: [SortHeader, MatButton, MatIcon, ZonedDateTimePipe],
  templateUrl: './member-table.html',
  styleUrl: './member-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MemberTable {
  readonly members = input.required<readonly Member[]>();
  readonly savingMemberIds = input<readonly number[]>([]);
  readonly currentUserId = input<number | null>(null);
  /** The co-op's time zone, for the dates shown. */
  readonly timeZone = input('UTC');
  readonly rolesChanged = output<RolesChange>();
  readonly activeChanged = output<ActiveChange>();
  readonly resetLinkRequested = output<number>();
  readonly sort = model<TableSort<MemberColumn>>({ column: 'name', direction: 'asc' });

  protected readonly sortable = SORTABLE;

  protected readonly rows = computed(() => {
    const saving = this.savingMemberIds();
    return sortRows(this.members(), this.sort(), valueOf).map((member) => ({
      member,
      saving: saving.includes(member.id),
      isYou: member.id === this.currentUserId(),
      roles: ROLES.map((role) => ({
        role,
        held: member.roles.includes(role),
        // A person keeps at least one role; removing the last one is not offered.
        locked: member.roles.length === 1 && member.roles.includes(role),
      })),
    }));
  });

  protected toggleRole(member: Member, role: Role): void {
    const roles = member.roles.includes(role)
      ? member.roles.filter((each) => each !== role)
      : ROLES.filter((each) => each === role || member.roles.includes(each));
    this.rolesChanged.emit({ memberId: member.id, roles });
  }

  protected toggleActive(member: Member): void {
    this.activeChanged.emit({ memberId: member.id, active: !member.active });
  }
}
