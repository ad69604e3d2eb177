import { ChangeDetectionStrategy, Component, computed, inject, OnInit } from '@angular/core';
import { MatAnchor } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { hasAnyRole } from '@shared/auth';
import { PayDuesRequest } from '@shared/dues';
import { authFeature } from '@app/auth/state/auth.feature';
import { DuesPaymentList } from '../dues-payment-list/dues-payment-list';
import { DuesStanding } from '../dues-standing/dues-standing';
import { PayDuesForm } from '../pay-dues-form/pay-dues-form';
import { DuesPageActions } from '../state/dues-page.actions';
import { duesFeature } from '../state/dues.feature';

@Component({
  selector: 'cw-dues-page',
  imports: [DuesStanding, PayDuesForm, DuesPaymentList, MatAnchor, RouterLink],
  templateUrl: './dues-page.html',
  styleUrl: './dues-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DuesPage implements OnInit {
  private readonly store = inject(Store);

  protected readonly overview = this.store.selectSignal(duesFeature.selectOverview);
  protected readonly loading = this.store.selectSignal(duesFeature.selectLoading);
  protected readonly loadError = this.store.selectSignal(duesFeature.selectLoadError);
  protected readonly paying = this.store.selectSignal(duesFeature.selectPaying);
  protected readonly paymentError = this.store.selectSignal(duesFeature.selectPaymentError);
  protected readonly paymentsMade = this.store.selectSignal(duesFeature.selectPaymentsMade);
  private readonly user = this.store.selectSignal(authFeature.selectUser);
  protected readonly timeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);
  protected readonly isAdmin = computed(() => hasAnyRole(this.user()?.roles ?? [], ['admin']));

  ngOnInit(): void {
    this.store.dispatch(DuesPageActions.opened());
  }

  protected pay(request: PayDuesRequest): void {
    this.store.dispatch(DuesPageActions.paymentSubmitted({ request }));
  }

  protected stopRenewal(): void {
    this.store.dispatch(DuesPageActions.renewalStopped());
  }
}
