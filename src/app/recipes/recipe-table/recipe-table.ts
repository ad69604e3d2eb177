import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { RecipeSummary } from '@shared/recipes';

/** A recipe row with the name of its style target and its volume in the person's units. */
export type RecipeListRow = RecipeSummary & { styleName: string | null; batchVolume: string };

/** The recipes the person can see, newest change first. */
@Component({
  selector: 'cw-recipe-table',
  imports: [RouterLink, DatePipe],
  templateUrl: './recipe-table.html',
  styleUrl: './recipe-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RecipeTable {
  readonly recipes = input.required<readonly RecipeListRow[]>();
}
