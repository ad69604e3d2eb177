import { CdkCopyToClipboard } from '@angular/cdk/clipboard';
import { DOCUMENT } from '@angular/common';
import { afterNextRender, ChangeDetectionStrategy, Component, computed, ElementRef, inject, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';
import { IssuedLink } from '../state/members.feature';

/** A freshly issued one-time link with a copy button, for the admin to hand over. */
@Component({
  selector: 'cw-issued-link-panel',
  imports: [CdkCopyToClipboard, MatButton, MatIcon, ZonedDateTimePipe],
  templateUrl: './issued-link-panel.html',
  styleUrl: './issued-link-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class IssuedLinkPanel {
  readonly issuedLink = input.required<IssuedLink>();
  readonly timeZone = input.required<string>();
  readonly copied = output<boolean>();
  readonly dismissed = output<void>();

  private readonly origin = inject(DOCUMENT).location?.origin ?? '';

  /** The link as something to paste elsewhere: absolute even if the server answered with a path. */
  protected readonly fullLink = computed(() => {
    const link = this.issuedLink().link;
    return link.startsWith('/') ? `${this.origin}${link}` : link;
  });
  protected readonly isInvitation = computed(() => this.issuedLink().kind === 'invitation');

  constructor() {
    const host = inject<ElementRef<HTMLElement>>(ElementRef);
    // The panel appears after an action further down the page: bring it into view and focus.
    afterNextRender(() => host.nativeElement.querySelector<HTMLElement>('h2')?.focus());
  }
}
