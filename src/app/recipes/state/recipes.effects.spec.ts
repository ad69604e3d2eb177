import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { Action, Store } from '@ngrx/store';
import { firstValueFrom, Observable, of, throwError, toArray } from 'rxjs';
import { generateMockDesign, Recipe, RECIPE_EXPORT_FORMAT } from '@shared/recipes';
import { generateMockRecipe, generateMockVersion } from '@app/testing/recipe-mock';
import { RecipesClient } from '../recipes-client';
import { RecipeEditorPageActions } from './recipe-editor-page.actions';
import { RecipeListPageActions } from './recipe-list-page.actions';
import { RecipeVersionsPageActions } from './recipe-versions-page.actions';
import { RecipeArchiveConfirmationActions } from './recipe-archive-confirmation.actions';
import { RecipesApiActions } from './recipes-api.actions';
import { exportRecipe, importRecipe } from './recipe-file.effects';
import { loadVersionPair } from './recipe-versions.effects';
import { saveRecipe, updateRecipe } from './recipes.effects';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
/** A store whose open recipe is `current`, for effects that compare with it. */
const storeWith = (current: Recipe | null) => ({ select: () => of(current) }) as unknown as Store;
const fakeClient = (overrides: Partial<Record<keyof RecipesClient, (...args: never[]) => Observable<unknown>>>) => overrides as unknown as RecipesClient;

describe('recipes effects', () => {
  it('saveRecipe creates a recipe that has no id yet and maps it to Recipe Created Success', async () => {
    const recipe = generateMockRecipe();
    const client = fakeClient({ create: jest.fn(() => of(recipe)), save: jest.fn() });
    const design = generateMockDesign();

    const result = await firstValueFrom(saveRecipe(actionsOf(RecipeEditorPageActions.saveSubmitted({ recipeId: null, design, visibility: 'private' })), client, storeWith(null)));

    expect(client.create).toHaveBeenCalledWith({ design, visibility: 'private' });
    expect(client.save).not.toHaveBeenCalled();
    expect(result).toEqual(RecipesApiActions.recipeCreatedSuccess({ recipe }));
  });

  it('saveRecipe saves an existing recipe as a new version', async () => {
    const recipe = generateMockRecipe({ version: 2 });
    const client = fakeClient({ save: jest.fn(() => of(recipe)) });
    const design = generateMockDesign({ batchVolumeLitres: 40 });

    const result = await firstValueFrom(
      saveRecipe(actionsOf(RecipeEditorPageActions.saveSubmitted({ recipeId: 41, design, visibility: 'coop' })), client, storeWith(generateMockRecipe())),
    );

    expect(client.save).toHaveBeenCalledWith(41, { design });
    expect(result).toEqual(RecipesApiActions.recipeSavedSuccess({ recipe }));
  });

  it('saveRecipe says nothing changed, without a request, when the design equals the open version', async () => {
    const client = fakeClient({ save: jest.fn() });
    const open = generateMockRecipe({ version: 3 });

    const result = await firstValueFrom(
      saveRecipe(actionsOf(RecipeEditorPageActions.saveSubmitted({ recipeId: 41, design: generateMockDesign(), visibility: 'private' })), client, storeWith(open)),
    );

    expect(client.save).not.toHaveBeenCalled();
    expect(result).toEqual(RecipesApiActions.recipeSaveUnchanged({ version: 3 }));
  });

  it('saveRecipe says nothing changed when the server keeps the version number', async () => {
    const open = generateMockRecipe({ version: 3 });
    const client = fakeClient({ save: jest.fn(() => of(open)) });

    const result = await firstValueFrom(
      saveRecipe(
        actionsOf(RecipeEditorPageActions.saveSubmitted({ recipeId: 41, design: generateMockDesign({ notes: 'x' }), visibility: 'private' })),
        client,
        storeWith(open),
      ),
    );

    expect(result).toEqual(RecipesApiActions.recipeSaveUnchanged({ version: 3 }));
  });

  it('saveRecipe turns a refusal into Recipe Saved Failure with the server’s words and keeps listening', async () => {
    const refusal = new HttpErrorResponse({ status: 403, error: { error: { code: 'not-owner', message: 'Only the owner may change this recipe.' } } });
    const client = fakeClient({ save: jest.fn(() => throwError(() => refusal)) });
    const submit = RecipeEditorPageActions.saveSubmitted({ recipeId: 41, design: generateMockDesign(), visibility: 'private' });

    const results = await firstValueFrom(saveRecipe(actionsOf(submit, submit), client, storeWith(null)).pipe(toArray()));

    expect(results).toEqual([
      RecipesApiActions.recipeSavedFailure({ message: 'Only the owner may change this recipe.' }),
      RecipesApiActions.recipeSavedFailure({ message: 'Only the owner may change this recipe.' }),
    ]);
  });

  it('updateRecipe archives by PATCH with archived only', async () => {
    const recipe = generateMockRecipe({ archived: true });
    const client = fakeClient({ update: jest.fn(() => of(recipe)) });

    const result = await firstValueFrom(updateRecipe(actionsOf(RecipeArchiveConfirmationActions.archiveConfirmed({ recipeId: 41, archived: true })), client));

    expect(client.update).toHaveBeenCalledWith(41, { archived: true });
    expect(result).toEqual(RecipesApiActions.recipeUpdatedSuccess({ recipe }));
  });

  it('importRecipe refuses a file of another format without calling the server', async () => {
    const client = fakeClient({ importRecipe: jest.fn() });

    const result = await firstValueFrom(importRecipe(actionsOf(RecipeListPageActions.importFileChosen({ fileName: 'x.json', text: '{"format":"other"}' })), client));

    expect(client.importRecipe).not.toHaveBeenCalled();
    expect(result.type).toBe(RecipesApiActions.recipeImportedFailure.type);
  });

  it('importRecipe sends a recipe file and maps the new recipe to Recipe Imported Success', async () => {
    const recipe = generateMockRecipe();
    const client = fakeClient({ importRecipe: jest.fn(() => of(recipe)) });
    const file = { format: RECIPE_EXPORT_FORMAT, formatVersion: 1, exportedAt: '2026-11-30T18:00:00Z', design: { name: 'Imported' } };

    const result = await firstValueFrom(importRecipe(actionsOf(RecipeListPageActions.importFileChosen({ fileName: 'x.json', text: JSON.stringify(file) })), client));

    expect(client.importRecipe).toHaveBeenCalledWith(file);
    expect(result).toEqual(RecipesApiActions.recipeImportedSuccess({ recipe }));
  });

  it('exportRecipe names the file after the recipe and pretty-prints it', async () => {
    const file = { format: RECIPE_EXPORT_FORMAT, formatVersion: 1, exportedAt: '2026-11-30T18:00:00Z', design: { name: 'Fernhollow Pale #2' } };
    const client = fakeClient({ exportRecipe: jest.fn(() => of(file)) });

    const result = await firstValueFrom(exportRecipe(actionsOf(RecipeEditorPageActions.exportRequested({ recipeId: 41 })), client));

    expect(result).toEqual(RecipesApiActions.recipeExportedSuccess({ fileName: 'fernhollow-pale-2.recipe.json', json: JSON.stringify(file, null, 2) }));
  });

  it('loadVersionPair loads both picked versions', async () => {
    const left = generateMockVersion(1);
    const right = generateMockVersion(2);
    const client = fakeClient({ version: jest.fn((_id: number, version: number) => of(version === 1 ? left : right)) });

    const result = await firstValueFrom(loadVersionPair(actionsOf(RecipeVersionsPageActions.versionsPicked({ recipeId: 41, left: 1, right: 2 })), client));

    expect(result).toEqual(RecipesApiActions.versionPairLoadedSuccess({ left, right }));
  });
});
