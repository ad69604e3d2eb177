import { ChangeDetectionStrategy, Component, inject, input, OnInit } from '@angular/core';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { AcceptInvitationRequest } from '@shared/auth';
import { PublicFrame } from '@app/ui/public-frame/public-frame';
import { RoleBadge } from '@app/ui/role-badge/role-badge';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';
import { AcceptInvitationForm } from '../accept-invitation-form/accept-invitation-form';
import { AcceptInvitationPageActions } from '../state/accept-invitation-page.actions';
import { accountFeature } from '../state/account.feature';
import { authFeature } from '../state/auth.feature';

@Component({
  selector: 'cw-accept-invitation-page',
  imports: [PublicFrame, AcceptInvitationForm, RoleBadge, RouterLink, ZonedDateTimePipe],
  templateUrl: './accept-invitation-page.html',
  styleUrl: './accept-invitation-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptInvitationPage implements OnInit {
  private readonly store = inject(Store);

  /** The invitation token from the link (route parameter). */
  readonly token = input.required<string>();

  protected readonly invitation = this.store.selectSignal(accountFeature.selectInvitation);
  protected readonly status = this.store.selectSignal(accountFeature.selectInvitationStatus);
  protected readonly submitting = this.store.selectSignal(accountFeature.selectSubmitting);
  protected readonly error = this.store.selectSignal(accountFeature.selectError);
  protected readonly fieldErrors = this.store.selectSignal(accountFeature.selectFieldErrors);
  protected readonly timeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);

  ngOnInit(): void {
    this.store.dispatch(AcceptInvitationPageActions.opened({ token: this.token() }));
  }

  protected join(request: AcceptInvitationRequest): void {
    this.store.dispatch(AcceptInvitationPageActions.submitted({ token: this.token(), ...request }));
  }
}
