import { ChangeDetectionStrategy, Component, computed, input, output, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { IssuedPushToken, PushTokenSummary, READINGS_PUSH_PATH } from '@shared/readings';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';

/** Tokens a gravity logger pushes readings with: made here, shown once, revoked after asking. */
@Component({
  selector: 'cw-push-tokens-panel',
  imports: [FormsModule, MatButton, MatFormField, MatLabel, MatInput, ZonedDateTimePipe],
  templateUrl: './push-tokens-panel.html',
  styleUrl: './push-tokens-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PushTokensPanel {
  readonly tokens = input.required<readonly PushTokenSummary[]>();
  readonly issued = input<IssuedPushToken | null>(null);
  readonly coopTimeZone = input.required<string>();
  readonly requested = output<string>();
  readonly revokeChosen = output<PushTokenSummary>();

  protected readonly label = signal('Gravity logger');
  protected readonly curl = computed(() => {
    const token = this.issued()?.token ?? '<token>';
    const origin = typeof location === 'undefined' ? '' : location.origin;
    return `curl -X POST ${origin}${READINGS_PUSH_PATH} -H 'Authorization: Bearer ${token}' -H 'Content-Type: application/json' -d '{"readings":[{"deviceTime":"2026-12-02T14:30:00Z","value":1.012,"temperatureC":18.5}]}'`;
  });

  protected request(): void {
    const label = this.label().trim();
    if (label) this.requested.emit(label);
  }
}
