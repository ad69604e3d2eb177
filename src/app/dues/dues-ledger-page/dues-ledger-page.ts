import { ChangeDetectionStrategy, Component, inject, OnInit } from '@angular/core';
import { MatAnchor } from '@angular/material/button';
import { Store } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { CreateDuesPlanRequest, DUES_LEDGER_CSV_PATH, RecordCashPaymentRequest } from '@shared/dues';
import { CashPaymentForm } from '../cash-payment-form/cash-payment-form';
import { DuesLedgerTable } from '../dues-ledger-table/dues-ledger-table';
import { DuesPaymentList } from '../dues-payment-list/dues-payment-list';
import { DuesPlanForm } from '../dues-plan-form/dues-plan-form';
import { DuesPlanList } from '../dues-plan-list/dues-plan-list';
import { DuesLedgerPageActions } from '../state/dues-ledger-page.actions';
import { duesFeature } from '../state/dues.feature';

@Component({
  selector: 'cw-dues-ledger-page',
  imports: [DuesLedgerTable, DuesPaymentList, CashPaymentForm, DuesPlanForm, DuesPlanList, MatAnchor],
  templateUrl: './dues-ledger-page.html',
  styleUrl: '../dues-page/dues-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DuesLedgerPage implements OnInit {
  private readonly store = inject(Store);

  protected readonly csvPath = DUES_LEDGER_CSV_PATH;
  protected readonly ledger = this.store.selectSignal(duesFeature.selectLedger);
  protected readonly loading = this.store.selectSignal(duesFeature.selectLedgerLoading);
  protected readonly loadError = this.store.selectSignal(duesFeature.selectLedgerError);
  protected readonly saving = this.store.selectSignal(duesFeature.selectLedgerSaving);
  protected readonly fieldErrors = this.store.selectSignal(duesFeature.selectLedgerFieldErrors);
  protected readonly changes = this.store.selectSignal(duesFeature.selectLedgerChanges);
  protected readonly timeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);

  ngOnInit(): void {
    this.store.dispatch(DuesLedgerPageActions.opened());
  }

  protected addPlan(request: CreateDuesPlanRequest): void {
    this.store.dispatch(DuesLedgerPageActions.planSubmitted({ request }));
  }

  protected changePlanActive(change: { planId: number; active: boolean }): void {
    this.store.dispatch(DuesLedgerPageActions.planActiveChanged(change));
  }

  protected recordCash(request: RecordCashPaymentRequest): void {
    this.store.dispatch(DuesLedgerPageActions.cashPaymentSubmitted({ request }));
  }

  protected refund(paymentId: number): void {
    this.store.dispatch(DuesLedgerPageActions.refundConfirmed({ paymentId }));
  }
}
