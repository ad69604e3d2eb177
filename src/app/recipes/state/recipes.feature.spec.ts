import { generateMockDesign } from '@shared/recipes';
import { generateMockRecipe } from '@app/testing/recipe-mock';
import { RecipeEditorPageActions } from './recipe-editor-page.actions';
import { RecipesApiActions } from './recipes-api.actions';
import { initialRecipesState, recipesFeature } from './recipes.feature';

const { reducer } = recipesFeature;

describe('recipesFeature reducer', () => {
  it('on Recipe Loaded Success keeps the recipe, lists it and hands its design to the form as a new revision', () => {
    const recipe = generateMockRecipe();

    const state = reducer(initialRecipesState, RecipesApiActions.recipeLoadedSuccess({ recipe }));

    expect(state.current).toBe(recipe);
    expect(state.draft).toBe(recipe.design);
    expect(state.draftRevision).toBe(1);
    expect(state.entities[recipe.id]?.name).toBe(recipe.name);
  });

  it('on Design Changed follows what is typed without a new revision', () => {
    const design = generateMockDesign({ batchVolumeLitres: 23 });

    const state = reducer(initialRecipesState, RecipeEditorPageActions.designChanged({ design }));

    expect([state.draft, state.draftRevision]).toEqual([design, 0]);
  });

  it('on Design Scaled replaces the draft and gives the form a new revision', () => {
    const design = generateMockDesign({ batchVolumeLitres: 40 });

    const state = reducer(initialRecipesState, RecipeEditorPageActions.designScaled({ design }));

    expect([state.draft, state.draftRevision]).toEqual([design, 1]);
  });

  it('on Save Submitted marks saving, and on Recipe Saved Failure clears it', () => {
    const saving = reducer(initialRecipesState, RecipeEditorPageActions.saveSubmitted({ recipeId: 41, design: generateMockDesign(), visibility: 'private' }));

    const failed = reducer(saving, RecipesApiActions.recipeSavedFailure({ message: 'No.' }));

    expect([saving.saving, failed.saving]).toEqual([true, false]);
  });

  it('on New Opened forgets the open recipe and its draft', () => {
    const open = reducer(initialRecipesState, RecipesApiActions.recipeLoadedSuccess({ recipe: generateMockRecipe() }));

    const state = reducer(open, RecipeEditorPageActions.newOpened());

    expect([state.current, state.draft]).toEqual([null, null]);
  });

  it('on Preferences Loaded Success takes the person’s unit system', () => {
    const state = reducer(initialRecipesState, RecipesApiActions.preferencesLoadedSuccess({ preferences: { unitSystem: 'us' } }));

    expect(state.unitSystem).toBe('us');
  });
});
