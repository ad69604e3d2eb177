import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { AcceptSlotRequest, BREW_PLAN_PATH, BrewPlanTimeline, MovePlannedBatchRequest, PlannedBatch, ProposalRequest, SlotProposals } from '@shared/brew-plan';
import { BrewerChoice } from '@shared/batches';
import { RECIPES_PATH, RecipeSummary } from '@shared/recipes';
import { Observable } from 'rxjs';

/** Typed calls to /api/brew-plan (and the recipe list the plan form offers). */
@Injectable({ providedIn: 'root' })
export class BrewPlanClient {
  private readonly http = inject(HttpClient);

  timeline(from: string, weeks: number): Observable<BrewPlanTimeline> {
    return this.http.get<BrewPlanTimeline>(`${BREW_PLAN_PATH}/timeline`, { params: new HttpParams().set('from', from).set('weeks', weeks) });
  }

  proposals(request: ProposalRequest): Observable<SlotProposals> {
    return this.http.post<SlotProposals>(`${BREW_PLAN_PATH}/proposals`, request);
  }

  accept(request: AcceptSlotRequest): Observable<PlannedBatch> {
    return this.http.post<PlannedBatch>(`${BREW_PLAN_PATH}/batches`, request);
  }

  move(batchId: number, request: MovePlannedBatchRequest): Observable<PlannedBatch> {
    return this.http.patch<PlannedBatch>(`${BREW_PLAN_PATH}/batches/${batchId}`, request);
  }

  /** Active brewers an admin may plan a batch for. */
  brewers(): Observable<BrewerChoice[]> {
    return this.http.get<BrewerChoice[]>(`${BREW_PLAN_PATH}/brewers`);
  }

  recipes(): Observable<RecipeSummary[]> {
    return this.http.get<RecipeSummary[]>(RECIPES_PATH);
  }
}
