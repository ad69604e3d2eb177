import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { generateMockCatalogue, generateMockDesign, MOCK_BREWHOUSE, predictRecipe } from '@shared/recipes';
import { generateMockRecipe, generateMockVersion } from '@app/testing/recipe-mock';
import { versionDifferences } from '../view-models/version-differences';
import { RecipeVersionsPageActions } from '../state/recipe-versions-page.actions';
import { selectRecipeVersionsViewModel } from '../state/recipes.selectors';
import { RecipeVersionsPage } from './recipe-versions-page';
import { authFeature } from '@app/auth/state/auth.feature';

describe('RecipeVersionsPage', () => {
  const catalogue = generateMockCatalogue();
  const left = generateMockVersion(1);
  const right = generateMockVersion(2, { design: generateMockDesign({ batchVolumeLitres: 40 }) });

  async function render(withComparison: boolean) {
    TestBed.configureTestingModule({
      imports: [RecipeVersionsPage],
      providers: [
        provideRouter([]),
        provideMockStore({
          selectors: [
            { selector: authFeature.selectCoopTimeZone, value: 'America/New_York' },
            {
              selector: selectRecipeVersionsViewModel,
              value: {
                recipe: generateMockRecipe({ version: 2 }),
                versions: [left, right],
                comparing: false,
                comparison: withComparison
                  ? {
                      left,
                      right,
                      rows: versionDifferences(
                        left,
                        right,
                        [predictRecipe(left.design, catalogue, MOCK_BREWHOUSE), predictRecipe(right.design, catalogue, MOCK_BREWHOUSE)],
                        'metric',
                      ),
                    }
                  : null,
              },
            },
          ],
        }),
      ],
    });
    const store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
    const fixture = TestBed.createComponent(RecipeVersionsPage);
    fixture.componentRef.setInput('recipeId', '41');
    await fixture.whenStable();
    return { store, element: fixture.nativeElement as HTMLElement };
  }

  it('dispatches Opened, proposes the last two versions and asks for them on Compare', async () => {
    const { store, element } = await render(false);

    [...element.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Compare')!.click();

    expect(store.dispatch).toHaveBeenCalledWith(RecipeVersionsPageActions.opened({ recipeId: 41 }));
    expect(store.dispatch).toHaveBeenCalledWith(RecipeVersionsPageActions.versionsPicked({ recipeId: 41, left: 1, right: 2 }));
  });

  it('lists each version with its date and time on the co-op clocks', async () => {
    const { element } = await render(false);

    // 18:00 UTC on 30 Nov 2026 is 13:00 in New York (UTC-5 in winter).
    expect(element.querySelector('li')?.textContent).toContain('Version 1 · 30 Nov 2026, 13:00');
  });

  it('marks the lines that differ between the two versions', async () => {
    const { element } = await render(true);

    const changed = [...element.querySelectorAll('[data-testid="changed-row"] th')].map((th) => th.textContent?.trim());
    // Doubling the volume halves gravity points, bitterness and colour; nothing else was changed.
    expect(changed).toEqual(['OG', 'FG', 'ABV density-based (%)', 'IBU', 'Colour (SRM)', 'Batch volume']);
    expect(element.querySelector('[role="status"]')?.textContent).toContain(`${changed.length} lines differ between version 1 and version 2`);
  });
});
