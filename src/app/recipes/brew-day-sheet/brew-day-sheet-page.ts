import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, effect, inject, input, untracked, ViewEncapsulation } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { TARGET_DIGITS } from '../prediction-panel/prediction-panel';
import { RecipeUnavailable } from '../recipe-unavailable/recipe-unavailable';
import { WaterPlan } from '../water-plan/water-plan';
import { BrewDaySheetPageActions } from '../state/brew-day-sheet-page.actions';
import { recipesFeature } from '../state/recipes.feature';
import { selectBrewDaySheetViewModel } from '../state/recipes.selectors';

/** A printable sheet for the brew day: ingredients, additions by time, targets, room for readings, cautions. */
@Component({
  selector: 'cw-brew-day-sheet-page',
  imports: [DecimalPipe, RouterLink, MatButton, MatIcon, WaterPlan, RecipeUnavailable],
  templateUrl: './brew-day-sheet-page.html',
  styleUrl: './brew-day-sheet-page.scss',
  // The print rules must reach the shell's toolbar and navigation, so they are not encapsulated.
  encapsulation: ViewEncapsulation.None,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BrewDaySheetPage {
  private readonly store = inject(Store);
  readonly recipeId = input.required<string>();

  protected readonly sheet = this.store.selectSignal(selectBrewDaySheetViewModel);
  protected readonly error = this.store.selectSignal(recipesFeature.selectCurrentError);
  protected readonly digits = TARGET_DIGITS;

  constructor() {
    effect(() => {
      const recipeId = Number(this.recipeId());
      untracked(() => this.store.dispatch(BrewDaySheetPageActions.opened({ recipeId })));
    });
  }

  protected print(): void {
    this.store.dispatch(BrewDaySheetPageActions.printRequested());
  }
}
