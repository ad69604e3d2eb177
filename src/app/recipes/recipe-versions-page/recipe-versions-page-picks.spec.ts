import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { generateMockCatalogue, MOCK_BREWHOUSE, predictRecipe } from '@shared/recipes';
import { generateMockRecipe, generateMockVersion } from '@app/testing/recipe-mock';
import { designDifferences } from '../view-models/design-differences';
import { RecipeVersionsPageActions } from '../state/recipe-versions-page.actions';
import { selectRecipeVersionsViewModel } from '../state/recipes.selectors';
import { RecipeVersionsPage } from './recipe-versions-page';

describe('RecipeVersionsPage picks', () => {
  const catalogue = generateMockCatalogue();
  const versions = [generateMockVersion(3), generateMockVersion(2), generateMockVersion(1)];
  const viewModel = (comparing: boolean, pair: [number, number] | null) => {
    const [left, right] = pair ? pair.map((n) => versions.find((each) => each.version === n)!) : [null, null];
    return {
      recipe: generateMockRecipe({ version: 3 }),
      versions,
      comparing,
      comparison: left && right && {
        left,
        right,
        rows: designDifferences(left.design, right.design, catalogue, 'metric'),
        predictions: [predictRecipe(left.design, catalogue, MOCK_BREWHOUSE), predictRecipe(right.design, catalogue, MOCK_BREWHOUSE)] as const,
      },
    };
  };

  async function choose(fixture: { whenStable(): Promise<unknown> }, element: HTMLElement, label: string, option: string): Promise<void> {
    const field = [...element.querySelectorAll('mat-form-field')].find((each) => each.textContent?.includes(label))!;
    field.querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
    await fixture.whenStable();
    const panel = document.getElementById(field.querySelector('mat-select')!.getAttribute('aria-controls')!)!;
    [...panel.querySelectorAll<HTMLElement>('mat-option')].find((each) => each.textContent?.trim() === option)!.click();
  }

  it('keeps the chosen versions in the selectors after Compare and asks for the same pair again on the next Compare', async () => {
    TestBed.configureTestingModule({
      imports: [RecipeVersionsPage],
      providers: [provideRouter([]), provideMockStore({ selectors: [{ selector: selectRecipeVersionsViewModel, value: viewModel(false, null) }] })],
    });
    const store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
    const fixture = TestBed.createComponent(RecipeVersionsPage);
    fixture.componentRef.setInput('recipeId', '41');
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    const compareButton = () => [...element.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Compare')!;
    const shownPicks = () => [...element.querySelectorAll('mat-select')].map((each) => each.textContent?.trim());

    await choose(fixture, element, 'Left version', 'Version 1');
    await fixture.whenStable();
    compareButton().click();
    store.overrideSelector(selectRecipeVersionsViewModel, viewModel(true, null));
    store.refreshState();
    await fixture.whenStable();
    store.overrideSelector(selectRecipeVersionsViewModel, viewModel(false, [1, 3]));
    store.refreshState();
    await fixture.whenStable();

    expect(shownPicks()).toEqual(['Version 1', 'Version 3']);
    compareButton().click();
    const picked = (store.dispatch as jest.Mock).mock.calls.map(([action]) => action).filter((action) => action.type === RecipeVersionsPageActions.versionsPicked.type);
    expect(picked).toEqual([
      RecipeVersionsPageActions.versionsPicked({ recipeId: 41, left: 1, right: 3 }),
      RecipeVersionsPageActions.versionsPicked({ recipeId: 41, left: 1, right: 3 }),
    ]);
  });
});
