import { ChangeDetectionStrategy, Component, inject, OnInit, signal } from '@angular/core';
import { Store } from '@ngrx/store';
import { ToleranceClass, ToleranceClassInput } from '@shared/strength-check';
import { BatchPicker } from '../batch-picker/batch-picker';
import { BlendPlanner } from '../blend-planner/blend-planner';
import { StrengthCautions } from '../strength-cautions/strength-cautions';
import { StrengthConverter } from '../strength-converter/strength-converter';
import { StrengthCheckPageActions } from '../state/strength-check-page.actions';
import { selectStrengthCheckPageViewModel } from '../state/strength-check.selectors';
import { ToleranceClassForm } from '../tolerance-class-form/tolerance-class-form';
import { ToleranceClassTable } from '../tolerance-class-table/tolerance-class-table';

/** The Strength check area: converter, blending planner, and the product classes' tolerances. */
@Component({
  selector: 'cw-strength-check-page',
  imports: [BatchPicker, StrengthConverter, BlendPlanner, StrengthCautions, ToleranceClassTable, ToleranceClassForm],
  templateUrl: './strength-check-page.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StrengthCheckPage implements OnInit {
  private readonly store = inject(Store);
  protected readonly vm = this.store.selectSignal(selectStrengthCheckPageViewModel);
  protected readonly editing = signal<ToleranceClass | null>(null);

  ngOnInit(): void {
    this.store.dispatch(StrengthCheckPageActions.opened());
  }

  protected saveToleranceClass(input: ToleranceClassInput): void {
    const editing = this.editing();
    this.editing.set(null);
    this.store.dispatch(editing ? StrengthCheckPageActions.toleranceClassChanged({ id: editing.id, input }) : StrengthCheckPageActions.toleranceClassAdded({ input }));
  }
}
