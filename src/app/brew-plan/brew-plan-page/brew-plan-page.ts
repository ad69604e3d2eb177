import { ChangeDetectionStrategy, Component, computed, inject, OnInit, signal } from '@angular/core';
import { MatAnchor, MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { DateTime } from 'luxon';
import { PLAN_PHASE_LABELS, SlotProposal } from '@shared/brew-plan';
import { authFeature } from '@app/auth/state/auth.feature';
import { FermenterLane, LaneMove } from '../fermenter-lane/fermenter-lane';
import { PlanBatchForm, PlanRequest } from '../plan-batch-form/plan-batch-form';
import { SlotProposals } from '../slot-proposals/slot-proposals';
import { BrewPlanPageActions } from '../state/brew-plan-page.actions';
import { brewPlanFeature } from '../state/brew-plan.feature';
import { TIMELINE_WEEKS } from '../timeline-weeks';
import { selectMayPlan, selectTimelineView } from '../state/brew-plan.selectors';

@Component({
  selector: 'cw-brew-plan-page',
  imports: [FermenterLane, PlanBatchForm, SlotProposals, MatAnchor, MatButton, MatIcon, RouterLink],
  templateUrl: './brew-plan-page.html',
  styleUrl: './brew-plan-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BrewPlanPage implements OnInit {
  private readonly store = inject(Store);

  protected readonly zone = this.store.selectSignal(authFeature.selectCoopTimeZone);
  protected readonly mayPlan = this.store.selectSignal(selectMayPlan);
  private readonly user = this.store.selectSignal(authFeature.selectUser);
  /** Admins also read the production report from here. */
  protected readonly isAdmin = computed(() => this.user()?.roles.includes('admin') ?? false);
  protected readonly timeline = this.store.selectSignal(selectTimelineView);
  protected readonly loading = this.store.selectSignal(brewPlanFeature.selectLoading);
  protected readonly loadError = this.store.selectSignal(brewPlanFeature.selectLoadError);
  protected readonly recipes = this.store.selectSignal(brewPlanFeature.selectRecipes);
  protected readonly brewers = this.store.selectSignal(brewPlanFeature.selectBrewers);
  protected readonly proposals = this.store.selectSignal(brewPlanFeature.selectProposals);
  protected readonly proposing = this.store.selectSignal(brewPlanFeature.selectProposing);
  protected readonly accepting = this.store.selectSignal(brewPlanFeature.selectAccepting);
  protected readonly planError = this.store.selectSignal(brewPlanFeature.selectPlanError);
  protected readonly planFieldErrors = this.store.selectSignal(brewPlanFeature.selectPlanFieldErrors);
  protected readonly slotsAccepted = this.store.selectSignal(brewPlanFeature.selectSlotsAccepted);
  protected readonly movingBatchId = this.store.selectSignal(brewPlanFeature.selectMovingBatchId);
  protected readonly moveError = this.store.selectSignal(brewPlanFeature.selectMoveError);
  protected readonly from = this.store.selectSignal(brewPlanFeature.selectFrom);
  protected readonly today = computed(() => DateTime.now().setZone(this.zone()).startOf('day'));
  protected readonly phaseLabels = Object.entries(PLAN_PHASE_LABELS);
  protected readonly fermenterChoices = computed(() => (this.timeline()?.lanes ?? []).filter((l) => l.inService).map((l) => ({ id: l.kitItemId, label: `${l.code} · ${l.capacity}` })));
  /** The batch name and request behind the proposals shown, for accepting one of them. */
  private readonly asked = signal<PlanRequest | null>(null);

  ngOnInit(): void {
    this.store.dispatch(BrewPlanPageActions.opened({ from: this.today().startOf('week').toISODate()!, mayPlan: this.mayPlan(), mayChooseBrewer: this.isAdmin() }));
  }

  protected step(weeks: number): void {
    const from = this.from();
    const next = weeks === 0 || !from ? this.today().startOf('week') : DateTime.fromISO(from).plus({ weeks });
    this.store.dispatch(BrewPlanPageActions.periodChanged({ from: next.toISODate()! }));
  }

  protected later(): void {
    this.step(TIMELINE_WEEKS);
  }

  protected earlier(): void {
    this.step(-TIMELINE_WEEKS);
  }

  protected requestProposals(plan: PlanRequest): void {
    this.asked.set(plan);
    this.store.dispatch(BrewPlanPageActions.proposalsRequested({ request: plan.request }));
  }

  protected planFormChanged(): void {
    if (this.proposals() || this.planError()) this.store.dispatch(BrewPlanPageActions.planFormChanged());
  }

  protected accept(slot: SlotProposal): void {
    const asked = this.asked();
    const proposals = this.proposals();
    if (!asked || !proposals) return;
    const { recipeId, recipeVersion, volumeLitres } = asked.request;
    const forBrewer = asked.brewerId === null ? {} : { brewerId: asked.brewerId };
    this.store.dispatch(
      BrewPlanPageActions.slotAccepted({ request: { name: asked.name, ...forBrewer, recipeId, recipeVersion, volumeLitres, kitItemId: slot.kitItemId, brewDate: slot.brewDate, ...proposals.schedule } }),
    );
  }

  protected move(move: LaneMove): void {
    this.store.dispatch(BrewPlanPageActions.batchMoveSubmitted({ batchId: move.batchId, request: { brewDate: move.brewDate, kitItemId: move.kitItemId } }));
  }
}
