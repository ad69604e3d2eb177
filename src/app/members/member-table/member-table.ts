import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';
import { ChangeDetectionStrategy, Component, computed, input, model, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatPaginator, PageEvent } from '@angular/material/paginator';
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

/** Members whose name or e-mail contains the words typed, in any case. */
export function matchingMembers(members: readonly Member[], query: string): readonly Member[] {
  const needle = query.trim().toLocaleLowerCase();
  if (!needle) return members;
  return members.filter((member) => `${member.name} ${member.email}`.toLocaleLowerCase().includes(needle));
}

/** The people of the co-op with their roles, state and the officer's actions on them. */
@Component({
  selector: 'cw-member-table',
  imports: [SortHeader, MatButton, MatIcon, MatFormField, MatLabel, MatInput, MatPaginator, ZonedDateTimePipe],
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
  protected readonly pageSizes = [25, 50, 100];
  protected readonly query = signal('');
  protected readonly page = signal({ pageIndex: 0, pageSize: 25 });

  /** A co-op of hundreds stays one page of rows at a time; the search finds anyone across pages. */
  protected readonly matching = computed(() => sortRows(matchingMembers(this.members(), this.query()), this.sort(), valueOf));

  protected readonly rows = computed(() => {
    const saving = this.savingMemberIds();
    const { pageIndex, pageSize } = this.page();
    return this.matching().slice(pageIndex * pageSize, (pageIndex + 1) * pageSize).map((member) => ({
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

  protected search(query: string): void {
    this.query.set(query);
    this.page.update((page) => ({ ...page, pageIndex: 0 }));
  }

  protected changePage(event: PageEvent): void {
    this.page.set({ pageIndex: event.pageIndex, pageSize: event.pageSize });
  }

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
