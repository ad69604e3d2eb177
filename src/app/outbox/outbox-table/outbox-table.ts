import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { OutboxMessageSummary, OutboxState } from '@shared/mail';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';

const STATE_TEXT: Record<OutboxState, string> = {
  queued: 'Queued',
  sending: 'Sending',
  sent: 'Sent',
  failed: 'Failed, will retry',
  abandoned: 'Given up',
};

/** The outbox, newest first: state, attempts and the last error of each message. */
@Component({
  selector: 'cw-outbox-table',
  imports: [ZonedDateTimePipe, MatButton],
  templateUrl: './outbox-table.html',
  styleUrl: '../../dues/dues-payment-list/dues-payment-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OutboxTable {
  readonly messages = input.required<OutboxMessageSummary[]>();
  readonly timeZone = input.required<string>();
  readonly messageOpened = output<number>();
  readonly retryClicked = output<number>();

  protected readonly stateText = STATE_TEXT;
}
