import { ChangeDetectionStrategy, Component, inject, OnInit } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { Store } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { MailPreview } from '../mail-preview/mail-preview';
import { OutboxTable } from '../outbox-table/outbox-table';
import { OutboxPageActions } from '../state/outbox-page.actions';
import { outboxFeature } from '../state/outbox.feature';

@Component({
  selector: 'cw-outbox-page',
  imports: [OutboxTable, MailPreview, MatButton],
  template: `
    <section class="cw-page">
      <div class="heading">
        <h1>Outbox</h1>
        <button mat-stroked-button type="button" (click)="refresh()">Refresh</button>
      </div>
      <p>Every e-mail the app writes waits here until the mail server has taken it; failed ones are tried again, waiting longer each time.</p>
      @if (opened(); as message) {
        <cw-mail-preview [message]="message" (closed)="close()" />
      }
      @if (loading() && messages().length === 0) {
        <p role="status">Loading the outbox…</p>
      } @else if (loadError(); as error) {
        <p class="cw-form-error" role="alert">{{ error }}</p>
      } @else {
        <cw-outbox-table [messages]="messages()" [timeZone]="timeZone()" (messageOpened)="open($event)" (retryClicked)="retry($event)" />
      }
    </section>
  `,
  styles: `
    .heading { display: flex; flex-wrap: wrap; gap: 12px; align-items: center; justify-content: space-between; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OutboxPage implements OnInit {
  private readonly store = inject(Store);

  protected readonly messages = this.store.selectSignal(outboxFeature.selectMessages);
  protected readonly loading = this.store.selectSignal(outboxFeature.selectLoading);
  protected readonly loadError = this.store.selectSignal(outboxFeature.selectLoadError);
  protected readonly opened = this.store.selectSignal(outboxFeature.selectOpened);
  protected readonly timeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);

  ngOnInit(): void {
    this.store.dispatch(OutboxPageActions.opened());
  }

  protected refresh(): void {
    this.store.dispatch(OutboxPageActions.refreshClicked());
  }

  protected open(id: number): void {
    this.store.dispatch(OutboxPageActions.messageOpened({ id }));
  }

  protected close(): void {
    this.store.dispatch(OutboxPageActions.messageClosed());
  }

  protected retry(id: number): void {
    this.store.dispatch(OutboxPageActions.retryClicked({ id }));
  }
}
