import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { SCHEDULE_BASIS_LABELS, SlotProposal, SlotProposals as Proposals } from '@shared/brew-plan';
import { formatCalendarDay, ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';

/** The planner's proposals, earliest first; the brewer accepts one. */
@Component({
  selector: 'cw-slot-proposals',
  imports: [MatButton, ZonedDateTimePipe],
  template: `
    @let p = proposals();
    <p class="schedule">
      {{ p.recipeName }}: {{ p.schedule.fermentationDays }} days fermentation, {{ p.schedule.conditioningDays }} days conditioning,
      {{ basisLabels[p.basis] }}. Searched from the week of {{ day(p.weekStart) }}.
    </p>
    @if (p.proposals.length) {
      <ul class="proposals" aria-label="Proposed slots">
        @for (slot of p.proposals; track slot.kitItemId) {
          <li>
            <div>
              <strong>{{ slot.kitItemCode }}</strong> · {{ slot.kitItemName }} · {{ slot.capacityLitres }} L
              <div class="when">Brew {{ day(slot.brewDate) }} · packaged by {{ day(slot.endLocal.slice(0, 10)) }}</div>
              <div class="held">Cleaning until {{ slot.heldUntil | cwZonedDateTime: timeZone() : 'date' }}</div>
            </div>
            <button mat-flat-button type="button" [disabled]="pending()" (click)="slotAccepted.emit(slot)">Accept {{ slot.kitItemCode }} from {{ day(slot.brewDate) }}</button>
          </li>
        }
      </ul>
    } @else {
      <p class="empty" role="status">No fermenter that holds this volume is free for the whole schedule within the search; try a later week or a smaller volume.</p>
    }
    @if (p.leftOut.length) {
      <h3 class="left-out-heading">Not proposed</h3>
      <ul class="left-out" aria-label="Fermenters not proposed">
        @for (item of p.leftOut; track item.kitItemId) {
          <li><strong>{{ item.kitItemCode }}</strong> · {{ item.kitItemName }}: {{ item.message }}</li>
        }
      </ul>
    }
  `,
  styles: `
    .proposals { list-style: none; padding: 0; margin: 0; display: grid; gap: 12px; }
    li { display: flex; flex-wrap: wrap; gap: 8px 16px; align-items: center; justify-content: space-between; padding: 8px 0; border-bottom: 1px solid var(--mat-sys-outline-variant); }
    .left-out-heading { font-size: 1rem; margin: 16px 0 4px; }
    .left-out { margin: 0; padding-left: 20px; font-size: 0.875rem; }
    .left-out li { display: list-item; border: 0; padding: 2px 0; }
    .when, .held, .schedule { font-size: 0.875rem; color: var(--mat-sys-on-surface-variant); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SlotProposals {
  readonly proposals = input.required<Proposals>();
  readonly timeZone = input.required<string>();
  readonly pending = input(false);
  readonly slotAccepted = output<SlotProposal>();

  protected readonly basisLabels = SCHEDULE_BASIS_LABELS;
  protected readonly day = formatCalendarDay;
}
