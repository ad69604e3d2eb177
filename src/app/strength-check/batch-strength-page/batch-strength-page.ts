import { ChangeDetectionStrategy, Component, inject, input, OnInit } from '@angular/core';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { DistillateAnalysisRequest, SignOffRequest } from '@shared/strength-check';
import { authFeature } from '@app/auth/state/auth.feature';
import { DeclaredStrengthForm } from '../declared-strength-form/declared-strength-form';
import { DistillateForm } from '../distillate-form/distillate-form';
import { SignOffList } from '../sign-off-list/sign-off-list';
import { StrengthCautions } from '../strength-cautions/strength-cautions';
import { StrengthFigures } from '../strength-figures/strength-figures';
import { BatchStrengthPageActions } from '../state/batch-strength-page.actions';
import { selectBatchStrengthPageViewModel } from '../state/batch-strength.selectors';

/** A batch's strength check: the working, the declared strength against its tolerance, sign-offs and lab analyses. */
@Component({
  selector: 'cw-batch-strength-page',
  imports: [RouterLink, StrengthFigures, DeclaredStrengthForm, SignOffList, DistillateForm, StrengthCautions],
  templateUrl: './batch-strength-page.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BatchStrengthPage implements OnInit {
  private readonly store = inject(Store);
  readonly batchId = input.required<string>();
  protected readonly vm = this.store.selectSignal(selectBatchStrengthPageViewModel);
  protected readonly id = () => Number(this.batchId());
  protected readonly timeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);

  ngOnInit(): void {
    this.store.dispatch(BatchStrengthPageActions.opened({ batchId: this.id() }));
  }

  protected checkDeclared(declared: SignOffRequest): void {
    this.store.dispatch(BatchStrengthPageActions.declaredStrengthChecked({ batchId: this.id(), declared }));
  }

  protected signOff(request: SignOffRequest): void {
    this.store.dispatch(BatchStrengthPageActions.signOffRequested({ batchId: this.id(), request }));
  }

  protected analyse(request: DistillateAnalysisRequest): void {
    this.store.dispatch(BatchStrengthPageActions.distillateAnalysed({ request }));
  }
}
