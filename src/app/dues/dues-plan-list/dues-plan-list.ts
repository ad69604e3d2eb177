import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { describePlanPrice, DuesPlan } from '@shared/dues';

/** The plans with a switch to retire one (members keep what they paid) or offer it again. */
@Component({
  selector: 'cw-dues-plan-list',
  imports: [MatButton],
  template: `
    <ul class="plans">
      @for (plan of plans(); track plan.id) {
        <li>
          <span [class.retired]="!plan.active">{{ plan.name }} · {{ describe(plan) }}{{ plan.active ? '' : ' (retired)' }}</span>
          <button mat-stroked-button type="button" [disabled]="pending()" (click)="activeChanged.emit({ planId: plan.id, active: !plan.active })">
            {{ plan.active ? 'Retire' : 'Offer again' }}<span class="cw-visually-hidden"> {{ plan.name }}</span>
          </button>
        </li>
      } @empty {
        <li>No plans yet.</li>
      }
    </ul>
  `,
  styles: `
    .plans { list-style: none; padding: 0; margin: 0 0 16px; }
    li { display: flex; flex-wrap: wrap; gap: 12px; align-items: center; justify-content: space-between; padding: 6px 0; }
    .retired { color: var(--mat-sys-on-surface-variant); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DuesPlanList {
  readonly plans = input.required<DuesPlan[]>();
  readonly pending = input(false);
  readonly activeChanged = output<{ planId: number; active: boolean }>();

  protected readonly describe = describePlanPrice;
}
