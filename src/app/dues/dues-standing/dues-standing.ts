import { ChangeDetectionStrategy, Component, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { DuesMembership } from '@shared/dues';

const STATUS_TEXT = {
  'paid-up': 'Paid up',
  'due-soon': 'Due soon',
  overdue: 'Overdue',
} as const;

/** Where the member's dues stand, and the saved card with a way to stop renewal (asked twice). */
@Component({
  selector: 'cw-dues-standing',
  imports: [MatButton],
  templateUrl: './dues-standing.html',
  styleUrl: './dues-standing.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DuesStanding {
  readonly membership = input.required<DuesMembership>();
  readonly renewalStopped = output<void>();

  protected readonly statusText = STATUS_TEXT;
  protected readonly confirming = signal(false);

  protected stop(): void {
    this.confirming.set(false);
    this.renewalStopped.emit();
  }
}
