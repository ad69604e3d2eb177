import { ChangeDetectionStrategy, Component, inject, OnInit } from '@angular/core';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { CreateBatchRequest } from '@shared/batches';
import { BatchStartForm } from '../batch-start-form/batch-start-form';
import { BatchStartPageActions } from '../state/batch-start-page.actions';
import { selectBatchStartViewModel } from '../state/batches.selectors';

/** Starts a batch from a recipe version, or from none for a brew made elsewhere. */
@Component({
  selector: 'cw-batch-start-page',
  imports: [BatchStartForm, RouterLink],
  template: `
    @let v = vm();
    <section class="cw-page">
      <p><a routerLink="/batches">← Batches</a></p>
      <h1>Start a batch</h1>
      <cw-batch-start-form
        [recipes]="v.recipes"
        [versions]="v.versions"
        [fermenters]="v.fermenters"
        [brewerName]="v.brewerName"
        [coopTimeZone]="v.coopTimeZone"
        [saving]="v.saving"
        [serverErrors]="v.fieldErrors"
        (recipeChosen)="chooseRecipe($event)"
        (started)="start($event)"
      />
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BatchStartPage implements OnInit {
  private readonly store = inject(Store);
  protected readonly vm = this.store.selectSignal(selectBatchStartViewModel);

  ngOnInit(): void {
    this.store.dispatch(BatchStartPageActions.opened());
  }

  protected chooseRecipe(recipeId: number): void {
    this.store.dispatch(BatchStartPageActions.recipeChosen({ recipeId }));
  }

  protected start(request: CreateBatchRequest): void {
    this.store.dispatch(BatchStartPageActions.startSubmitted({ request }));
  }
}
