import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, input, OnInit } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { INSTRUMENT_LABELS } from '@shared/readings';
import { authFeature } from '@app/auth/state/auth.feature';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';
import { batchStrengthFeature } from '../state/batch-strength.feature';
import { StrengthRecordPageActions } from '../state/strength-record-page.actions';

/** The one-page strength record of a sign-off, laid out to print; it shows the snapshot as signed. */
@Component({
  selector: 'cw-strength-record-page',
  imports: [ZonedDateTimePipe, DecimalPipe, RouterLink, MatButton],
  templateUrl: './strength-record-page.html',
  styleUrl: './strength-record-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StrengthRecordPage implements OnInit {
  private readonly store = inject(Store);
  readonly batchId = input.required<string>();
  readonly signOffId = input.required<string>();
  protected readonly record = this.store.selectSignal(batchStrengthFeature.selectRecord);
  protected readonly error = this.store.selectSignal(batchStrengthFeature.selectError);
  protected readonly instruments = INSTRUMENT_LABELS;
  protected readonly timeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);

  ngOnInit(): void {
    this.store.dispatch(StrengthRecordPageActions.opened({ batchId: Number(this.batchId()), signOffId: Number(this.signOffId()) }));
  }

  protected print(): void {
    window.print();
  }
}
