import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { SignOffSummary } from '@shared/strength-check';

/** The batch's sign-offs, newest first; one whose readings have changed since is marked stale. */
@Component({
  selector: 'cw-sign-off-list',
  imports: [ZonedDateTimePipe, RouterLink],
  template: `
    @if (signOffs().length === 0) {
      <p>Not signed off yet.</p>
    } @else {
      <ul class="sign-offs">
        @for (s of signOffs(); track s.id) {
          <li [attr.data-testid]="'sign-off-' + s.id">
            <a [routerLink]="['/strength-check', 'batches', batchId(), 'records', s.id]">{{ s.declaredPercentVolume }} % vol ({{ s.verdict }})</a>
            signed by {{ s.signedBy }}, {{ s.signedAt | cwZonedDateTime: timeZone() }}
            @if (s.stale) {
              <strong class="stale">Stale: the readings changed since; sign again.</strong>
            }
          </li>
        }
      </ul>
    }
  `,
  styles: `.stale { color: var(--mat-sys-error); margin-left: 8px; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignOffList {
  readonly batchId = input.required<number>();
  readonly signOffs = input.required<SignOffSummary[]>();
  readonly timeZone = input.required<string>();
}
