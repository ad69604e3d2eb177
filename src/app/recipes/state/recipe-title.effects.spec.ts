import { Title } from '@angular/platform-browser';
import { Router } from '@angular/router';
import { Actions } from '@ngrx/effects';
import { firstValueFrom, of } from 'rxjs';
import { generateMockRecipe } from '@app/testing/recipe-mock';
import { recipeTabTitle } from '../view-models/recipe-tab-title';
import { showRecipeTitle } from './recipe-title.effects';
import { RecipesApiActions } from './recipes-api.actions';

describe('recipe title effects', () => {
  it('names the recipe in the browser tab once it is loaded', async () => {
    const setTitle = jest.fn();
    const recipe = generateMockRecipe({ name: 'Lantern Strong Dark' });

    await firstValueFrom(
      showRecipeTitle(new Actions(of(RecipesApiActions.recipeLoadedSuccess({ recipe }))), { setTitle } as unknown as Title, { url: '/recipes/4' } as Router),
    );

    expect(setTitle).toHaveBeenCalledWith('Lantern Strong Dark · Commonwort');
  });

  it('says which page of the recipe is open', () => {
    expect(recipeTabTitle('/recipes/4/versions', 'Hearthside Mild')).toBe('Versions of Hearthside Mild · Commonwort');
    expect(recipeTabTitle('/recipes/4/brew-day?print=1', 'Hearthside Mild')).toBe('Brew day: Hearthside Mild · Commonwort');
  });
});
