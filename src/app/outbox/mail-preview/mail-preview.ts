import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { DomSanitizer } from '@angular/platform-browser';
import { OutboxMessage } from '@shared/mail';

/** One message as sent: its HTML part in a sandboxed frame (no scripts, no same origin) and its text part. */
@Component({
  selector: 'cw-mail-preview',
  imports: [MatButton],
  templateUrl: './mail-preview.html',
  styleUrl: './mail-preview.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MailPreview {
  readonly message = input.required<OutboxMessage>();
  readonly closed = output<void>();

  private readonly sanitizer = inject(DomSanitizer);
  /** The app writes these messages itself, escaping every value; the empty sandbox keeps them inert all the same. */
  protected readonly htmlDocument = computed(() => this.sanitizer.bypassSecurityTrustHtml(this.message().html));
}
