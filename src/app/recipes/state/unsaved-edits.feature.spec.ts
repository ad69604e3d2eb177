import { RecipeEditorPageActions } from './recipe-editor-page.actions';
import { RecipesApiActions } from './recipes-api.actions';
import { initialUnsavedEditsState, unsavedEditsFeature } from './unsaved-edits.feature';

const reduce = unsavedEditsFeature.reducer;

describe('unsaved edits', () => {
  it('marks the design unsaved after an edit or a scale', () => {
    expect(reduce(initialUnsavedEditsState, RecipeEditorPageActions.designEdited()).unsaved).toBe(true);
    expect(reduce(initialUnsavedEditsState, RecipeEditorPageActions.designScaled({ design: {} as never })).unsaved).toBe(true);
  });

  it('clears the marker when a save finds nothing changed: the editor holds what the version holds', () => {
    const edited = reduce(initialUnsavedEditsState, RecipeEditorPageActions.designEdited());
    expect(reduce(edited, RecipesApiActions.recipeSaveUnchanged({ version: 3 })).unsaved).toBe(false);
  });

  it('keeps the marker when a save fails', () => {
    const edited = reduce(initialUnsavedEditsState, RecipeEditorPageActions.designEdited());
    expect(reduce(edited, RecipesApiActions.recipeSavedFailure({ message: 'The recipe could not be saved.' })).unsaved).toBe(true);
  });
});
