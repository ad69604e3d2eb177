import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { authFeature } from '@app/auth/state/auth.feature';
import { generateMockRecipe } from '@app/testing/recipe-mock';
import { RecipeListPageActions } from '../state/recipe-list-page.actions';
import { selectRecipeListViewModel } from '../state/recipes.selectors';
import { RecipeListPage } from './recipe-list-page';

describe('RecipeListPage', () => {
  async function render() {
    const { design: _design, editable: _editable, createdAt: _createdAt, ...summary } = generateMockRecipe({ visibility: 'coop' });
    TestBed.configureTestingModule({
      imports: [RecipeListPage],
      providers: [
        provideRouter([]),
        provideMockStore({
          selectors: [
            { selector: authFeature.selectCoopTimeZone, value: 'UTC' },
            { selector: selectRecipeListViewModel, value: { recipes: [{ ...summary, styleName: 'Co-op pale', batchVolume: '20 L' }], search: '', includeArchived: false, loading: false, error: null } },
          ],
        }),
      ],
    });
    const store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
    const fixture = TestBed.createComponent(RecipeListPage);
    await fixture.whenStable();
    return { store, element: fixture.nativeElement as HTMLElement, fixture };
  }

  it('dispatches Opened when shown and lists each recipe with a link to it', async () => {
    const { store, element } = await render();

    expect(store.dispatch).toHaveBeenCalledWith(RecipeListPageActions.opened());
    const link = element.querySelector<HTMLAnchorElement>('tbody a');
    expect([link?.textContent?.trim(), link?.getAttribute('href')]).toEqual(['Fernhollow pale', '/recipes/41']);
    expect(element.querySelector('tbody tr')?.textContent).toContain('Co-op pale');
  });

  it('dispatches Search Changed as the person types', async () => {
    const { store, element, fixture } = await render();
    const input = element.querySelector<HTMLInputElement>('input[type="search"]')!;

    input.value = 'pale';
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();

    expect(store.dispatch).toHaveBeenCalledWith(RecipeListPageActions.searchChanged({ search: 'pale' }));
  });

  it('reads a chosen recipe file and dispatches Import File Chosen with its text', async () => {
    const { store, element } = await render();
    const input = element.querySelector<HTMLInputElement>('input[type="file"]')!;
    const file = new File(['{"format":"commonwort-recipe"}'], 'pale.recipe.json', { type: 'application/json' });
    Object.defineProperty(file, 'text', { value: () => Promise.resolve('{"format":"commonwort-recipe"}') });
    Object.defineProperty(input, 'files', { value: [file] });

    input.dispatchEvent(new Event('change'));
    await new Promise((resolve) => setTimeout(resolve));

    expect(store.dispatch).toHaveBeenCalledWith(RecipeListPageActions.importFileChosen({ fileName: 'pale.recipe.json', text: '{"format":"commonwort-recipe"}' }));
  });
});
