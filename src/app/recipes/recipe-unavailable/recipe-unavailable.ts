import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

/** Why a recipe cannot be shown (not there, or not visible to this person), said once, with the way back. */
@Component({
  selector: 'cw-recipe-unavailable',
  imports: [RouterLink, MatIcon],
  template: `
    <p class="cw-form-error" role="alert" data-testid="recipe-unavailable">{{ message() }}</p>
    <p>
      <a routerLink="/recipes"><mat-icon aria-hidden="true" inline>arrow_back</mat-icon> Back to the recipes</a>
    </p>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RecipeUnavailable {
  readonly message = input.required<string>();
}
