import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatOption, MatSelect } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';
import { RecipeUnavailable } from '../recipe-unavailable/recipe-unavailable';
import { VersionDiff } from '../version-diff/version-diff';
import { RecipeVersionsPageActions } from '../state/recipe-versions-page.actions';
import { recipesFeature } from '../state/recipes.feature';
import { selectRecipeVersionsViewModel } from '../state/recipes.selectors';

/** A recipe's versions: pick two and see them side by side. */
@Component({
  selector: 'cw-recipe-versions-page',
  imports: [VersionDiff, RecipeUnavailable, RouterLink, FormsModule, ZonedDateTimePipe, MatButton, MatFormField, MatLabel, MatSelect, MatOption],
  templateUrl: './recipe-versions-page.html',
  styleUrl: './recipe-versions-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RecipeVersionsPage {
  private readonly store = inject(Store);
  readonly recipeId = input.required<string>();

  protected readonly vm = this.store.selectSignal(selectRecipeVersionsViewModel);
  protected readonly error = this.store.selectSignal(recipesFeature.selectCurrentError);
  protected readonly timeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);
  protected readonly left = signal<number | null>(null);
  protected readonly right = signal<number | null>(null);
  /** The version numbers alone, so a comparison arriving in the view model does not count as a new list. */
  private readonly versionNumbers = computed(() => this.vm().versions.map((each) => each.version).sort((a, b) => a - b), {
    equal: (a, b) => a.length === b.length && a.every((each, index) => each === b[index]),
  });

  constructor() {
    effect(() => {
      const recipeId = Number(this.recipeId());
      untracked(() => this.store.dispatch(RecipeVersionsPageActions.opened({ recipeId })));
    });
    // The last two versions are proposed; a pick stays as long as its version exists.
    effect(() => {
      const versions = this.versionNumbers();
      untracked(() => {
        if (!versions.includes(this.right() ?? NaN)) this.right.set(versions.at(-1) ?? null);
        if (!versions.includes(this.left() ?? NaN)) this.left.set(versions.at(-2) ?? versions.at(-1) ?? null);
      });
    });
  }

  protected compare(): void {
    const left = this.left();
    const right = this.right();
    if (left !== null && right !== null) {
      this.store.dispatch(RecipeVersionsPageActions.versionsPicked({ recipeId: Number(this.recipeId()), left, right }));
    }
  }
}
