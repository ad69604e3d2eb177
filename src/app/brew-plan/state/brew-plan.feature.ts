import { createFeature, createReducer, on } from '@ngrx/store';
import { BrewerChoice } from '@shared/batches';
import { BrewPlanTimeline, SlotProposals } from '@shared/brew-plan';
import { RecipeSummary } from '@shared/recipes';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { FieldErrors } from '@app/ui/server-field-errors';
import { BrewPlanApiActions } from './brew-plan-api.actions';
import { BrewPlanPageActions } from './brew-plan-page.actions';

export interface BrewPlanState {
  /** First day shown, yyyy-MM-dd in the co-op's zone. */
  from: string | null;
  timeline: BrewPlanTimeline | null;
  loading: boolean;
  loadError: string | null;
  recipes: RecipeSummary[];
  /** Whom an admin may plan for; empty for everyone else. */
  brewers: BrewerChoice[];
  proposals: SlotProposals | null;
  proposing: boolean;
  accepting: boolean;
  planError: string | null;
  planFieldErrors: FieldErrors | null;
  /** Counts accepted slots so the form can clear itself after each. */
  slotsAccepted: number;
  movingBatchId: number | null;
  /** What collided when a planned batch was moved, by batch. */
  moveError: { batchId: number; message: string } | null;
}

export const initialBrewPlanState: BrewPlanState = {
  from: null,
  timeline: null,
  loading: false,
  loadError: null,
  recipes: [],
  brewers: [],
  proposals: null,
  proposing: false,
  accepting: false,
  planError: null,
  planFieldErrors: null,
  slotsAccepted: 0,
  movingBatchId: null,
  moveError: null,
};

export const brewPlanFeature = createFeature({
  name: 'brewPlan',
  reducer: createReducer(
    initialBrewPlanState,
    on(BrewPlanPageActions.opened, BrewPlanPageActions.periodChanged, (state, { from }): BrewPlanState => ({ ...state, from, loading: true, loadError: null })),
    on(BrewPlanApiActions.timelineLoadedSuccess, (state, { timeline }): BrewPlanState => ({ ...state, timeline, loading: false })),
    on(BrewPlanApiActions.timelineLoadedFailure, (state, { message }): BrewPlanState => ({ ...state, loading: false, loadError: message })),
    on(BrewPlanApiActions.recipesLoadedSuccess, (state, { recipes }): BrewPlanState => ({ ...state, recipes })),
    on(BrewPlanApiActions.brewersLoadedSuccess, (state, { brewers }): BrewPlanState => ({ ...state, brewers })),
    on(BrewPlanPageActions.proposalsRequested, (state): BrewPlanState => ({ ...state, proposing: true, proposals: null, planError: null, planFieldErrors: null })),
    on(BrewPlanPageActions.planFormChanged, (state): BrewPlanState => (state.proposals || state.planError ? { ...state, proposals: null, planError: null } : state)),
    on(BrewPlanApiActions.proposalsLoadedSuccess, (state, { proposals }): BrewPlanState => ({ ...state, proposing: false, proposals })),
    on(BrewPlanApiActions.proposalsLoadedFailure, (state, { message, fields }): BrewPlanState => ({ ...state, proposing: false, planError: message, planFieldErrors: fields })),
    on(BrewPlanPageActions.slotAccepted, (state): BrewPlanState => ({ ...state, accepting: true, planError: null, planFieldErrors: null })),
    on(BrewPlanApiActions.slotAcceptedSuccess, (state): BrewPlanState => ({ ...state, accepting: false, proposals: null, slotsAccepted: state.slotsAccepted + 1 })),
    on(BrewPlanApiActions.slotAcceptedFailure, (state, { message, fields }): BrewPlanState => ({ ...state, accepting: false, planError: message, planFieldErrors: fields })),
    on(BrewPlanPageActions.batchMoveSubmitted, (state, { batchId }): BrewPlanState => ({ ...state, movingBatchId: batchId, moveError: null })),
    on(BrewPlanApiActions.batchMovedSuccess, (state): BrewPlanState => ({ ...state, movingBatchId: null })),
    on(BrewPlanApiActions.batchMovedFailure, (state, { batchId, message }): BrewPlanState => ({ ...state, movingBatchId: null, moveError: { batchId, message } })),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (): BrewPlanState => initialBrewPlanState),
  ),
});
