import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatButtonToggle, MatButtonToggleGroup } from '@angular/material/button-toggle';
import { MatIcon } from '@angular/material/icon';
import { MatSlideToggle } from '@angular/material/slide-toggle';
import { RouterLink } from '@angular/router';
import { Recipe, RecipeVisibility, UnitSystem } from '@shared/recipes';

/** What can be done with the open recipe: scale, clone, share, archive, export, print, versions, units. */
@Component({
  selector: 'cw-recipe-actions',
  imports: [MatButton, MatIcon, MatSlideToggle, MatButtonToggleGroup, MatButtonToggle, RouterLink],
  templateUrl: './recipe-actions.html',
  styleUrl: './recipe-actions.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RecipeActions {
  readonly recipe = input<Recipe | null>(null);
  readonly saving = input(false);
  readonly unitSystem = input<UnitSystem>('metric');
  /** Admins may archive any recipe, not only their own. */
  readonly canArchiveAny = input(false);
  readonly scaleOpened = output<void>();
  readonly cloneRequested = output<void>();
  readonly visibilityChanged = output<RecipeVisibility>();
  readonly archiveToggled = output<boolean>();
  readonly exportRequested = output<void>();
  readonly unitSystemChanged = output<UnitSystem>();
}
