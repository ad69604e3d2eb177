import { ChangeDetectionStrategy, Component, inject, OnInit } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { RecipeTable } from '../recipe-table/recipe-table';
import { RecipeListPageActions } from '../state/recipe-list-page.actions';
import { selectRecipeListViewModel } from '../state/recipes.selectors';

/** The recipes the person can see, with search, archived toggle, new recipe and file import. */
@Component({
  selector: 'cw-recipe-list-page',
  imports: [RecipeTable, RouterLink, MatButton, MatIcon, MatCheckbox, MatFormField, MatLabel, MatInput],
  templateUrl: './recipe-list-page.html',
  styleUrl: './recipe-list-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RecipeListPage implements OnInit {
  private readonly store = inject(Store);

  protected readonly vm = this.store.selectSignal(selectRecipeListViewModel);
  protected readonly timeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);

  ngOnInit(): void {
    this.store.dispatch(RecipeListPageActions.opened());
  }

  protected search(search: string): void {
    this.store.dispatch(RecipeListPageActions.searchChanged({ search }));
  }

  protected includeArchived(includeArchived: boolean): void {
    this.store.dispatch(RecipeListPageActions.includeArchivedChanged({ includeArchived }));
  }

  protected async importFile(input: HTMLInputElement): Promise<void> {
    const file = input.files?.[0];
    if (!file) return;
    const text = await file.text();
    input.value = '';
    this.store.dispatch(RecipeListPageActions.importFileChosen({ fileName: file.name, text }));
  }
}
