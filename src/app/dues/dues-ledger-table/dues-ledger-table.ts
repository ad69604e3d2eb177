import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatButtonToggle, MatButtonToggleGroup } from '@angular/material/button-toggle';
import { DuesLedgerMember, DuesStatus } from '@shared/dues';

type Filter = DuesStatus | 'all';

const STATUS_TEXT: Record<DuesStatus, string> = { 'paid-up': 'Paid up', 'due-soon': 'Due soon', overdue: 'Overdue' };

/** Every active member's standing, filtered by status. */
@Component({
  selector: 'cw-dues-ledger-table',
  imports: [MatButtonToggleGroup, MatButtonToggle],
  templateUrl: './dues-ledger-table.html',
  styleUrl: '../dues-payment-list/dues-payment-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DuesLedgerTable {
  readonly members = input.required<DuesLedgerMember[]>();

  protected readonly filter = signal<Filter>('all');
  protected readonly statusText = STATUS_TEXT;
  protected readonly shown = computed(() => (this.filter() === 'all' ? this.members() : this.members().filter((m) => m.status === this.filter())));
  protected readonly counts = computed(() => {
    const counts: Record<Filter, number> = { all: this.members().length, 'paid-up': 0, 'due-soon': 0, overdue: 0 };
    for (const m of this.members()) counts[m.status]++;
    return counts;
  });
}
