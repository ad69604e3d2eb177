import { Actions } from '@ngrx/effects';
import { Store } from '@ngrx/store';
import { firstValueFrom, isEmpty, of } from 'rxjs';
import { generateMockRecipe } from '@app/testing/recipe-mock';
import { ConfirmQuestion } from '@app/ui/confirm-dialog/confirm-dialog';
import { Confirmation } from '@app/ui/confirmation';
import { RecipeArchiveConfirmationActions } from './recipe-archive-confirmation.actions';
import { confirmArchive } from './recipe-archive-confirmation.effects';
import { RecipeEditorPageActions } from './recipe-editor-page.actions';

const recipe = generateMockRecipe({ id: 41, name: 'Hearthside Mild' });
const store = { select: () => of(recipe) } as unknown as Store;

function answering(answer: boolean) {
  const asked: ConfirmQuestion[] = [];
  return { asked, confirmation: { ask: (question: ConfirmQuestion) => (asked.push(question), of(answer)) } as unknown as Confirmation };
}

describe('recipe archive confirmation', () => {
  it('asks before archiving and archives nothing on cancel', async () => {
    const { asked, confirmation } = answering(false);
    const toggled = new Actions(of(RecipeEditorPageActions.archiveToggled({ recipeId: 41, archived: true })));

    expect(await firstValueFrom(confirmArchive(toggled, store, confirmation).pipe(isEmpty()))).toBe(true);
    expect(asked[0].title).toBe('Archive Hearthside Mild?');
  });

  it('restores from the archive without asking', async () => {
    const { asked, confirmation } = answering(false);
    const toggled = new Actions(of(RecipeEditorPageActions.archiveToggled({ recipeId: 41, archived: false })));

    const result = await firstValueFrom(confirmArchive(toggled, store, confirmation));

    expect(asked).toEqual([]);
    expect(result).toEqual(RecipeArchiveConfirmationActions.archiveConfirmed({ recipeId: 41, archived: false }));
  });
});
