import { ChangeDetectionStrategy, Component, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';

/** The private calendar-feed link: issue, replace or revoke it; the address shows once, right after issuing. */
@Component({
  selector: 'cw-feed-link-panel',
  imports: [MatButton],
  template: `
    <p>Subscribe to your bookings from a calendar app with a private link. Anyone holding the link sees your bookings, so keep it to yourself.</p>
    @if (url(); as address) {
      <p class="address">
        <label for="cw-feed-url">Your calendar link (shown only now):</label>
        <input id="cw-feed-url" readonly [value]="address" (focus)="$any($event.target).select()" />
      </p>
    } @else if (active()) {
      <p>You have a calendar link. Replacing it stops the old one from working.</p>
    }
    <div class="cw-form-actions">
      <button mat-stroked-button type="button" (click)="linkRequested.emit()">{{ active() ? 'Replace the link' : 'Get a calendar link' }}</button>
      @if (active()) {
        @if (confirmingRevoke()) {
          <span>Stop the link? Calendar apps using it will stop updating.</span>
          <button mat-flat-button type="button" (click)="revoke()">Yes, stop it</button>
          <button mat-button type="button" (click)="confirmingRevoke.set(false)">Keep it</button>
        } @else {
          <button mat-button type="button" (click)="confirmingRevoke.set(true)">Revoke the link</button>
        }
      }
    </div>
  `,
  styles: `
    .address input {
      width: 100%;
      font: inherit;
      padding: 6px;
      box-sizing: border-box;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FeedLinkPanel {
  readonly active = input(false);
  readonly url = input<string | null>(null);
  readonly linkRequested = output<void>();
  readonly linkRevoked = output<void>();

  protected readonly confirmingRevoke = signal(false);

  protected revoke(): void {
    this.confirmingRevoke.set(false);
    this.linkRevoked.emit();
  }
}
