import { ChangeDetectionStrategy, Component, computed, input, model } from '@angular/core';
import { RouterLink } from '@angular/router';
import { RecipeSummary } from '@shared/recipes';
import { SortHeader } from '@app/ui/sort-header/sort-header';
import { sortRows, TableSort } from '@app/ui/table-sort/table-sort';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';

/** A recipe row with the name of its style target and its volume in the person's units. */
export type RecipeListRow = RecipeSummary & { styleName: string | null; batchVolume: string };

export type RecipeColumn = 'name' | 'style' | 'batch' | 'owner' | 'shared' | 'version' | 'changed';

const COLUMNS: { key: RecipeColumn; label: string }[] = [
  { key: 'name', label: 'Name' },
  { key: 'style', label: 'Style' },
  { key: 'batch', label: 'Batch' },
  { key: 'owner', label: 'Owner' },
  { key: 'shared', label: 'Shared' },
  { key: 'version', label: 'Version' },
  { key: 'changed', label: 'Changed' },
];

function valueOf(recipe: RecipeListRow, column: string): string | number | null {
  const values: Record<RecipeColumn, string | number | null> = {
    name: recipe.name,
    style: recipe.styleName,
    batch: recipe.batchVolumeLitres,
    owner: recipe.ownerName,
    shared: recipe.visibility,
    version: recipe.version,
    changed: recipe.updatedAt,
  };
  return values[column as RecipeColumn];
}

/** The recipes the person can see, sortable by any column; a list of cards on a phone. */
@Component({
  selector: 'cw-recipe-table',
  imports: [SortHeader, RouterLink, ZonedDateTimePipe],
  templateUrl: './recipe-table.html',
  styleUrl: './recipe-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RecipeTable {
  readonly recipes = input.required<readonly RecipeListRow[]>();
  /** The search the rows were filtered by; an empty result then says that nothing matched. */
  readonly search = input('');
  /** IANA zone the change times are shown in. */
  readonly timeZone = input('UTC');
  readonly sort = model<TableSort<RecipeColumn>>({ column: 'changed', direction: 'desc' });

  protected readonly columns = COLUMNS;
  protected readonly sorted = computed(() => sortRows(this.recipes(), this.sort(), valueOf));
}
