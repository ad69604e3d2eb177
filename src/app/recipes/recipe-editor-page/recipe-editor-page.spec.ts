import { formatNumber } from '@angular/common';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { provideState, provideStore, Store } from '@ngrx/store';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { generateMockCatalogue, MOCK_BREWHOUSE, predictRecipe, RecipeDesign } from '@shared/recipes';
import { generateMockRecipe } from '@app/testing/recipe-mock';
import { authFeature, initialAuthState } from '@app/auth/state/auth.feature';
import { emptyDesign } from '../view-models/recipe-form-model';
import { CatalogueApiActions } from '@app/catalogue/state/catalogue-api.actions';
import { catalogueFeature } from '@app/catalogue/state/catalogue.feature';
import { RecipeEditorPageActions } from '../state/recipe-editor-page.actions';
import { recipesFeature } from '../state/recipes.feature';
import { initialUnsavedEditsState, unsavedEditsFeature } from '../state/unsaved-edits.feature';
import { RecipeEditorPage } from './recipe-editor-page';

const catalogue = generateMockCatalogue();

// The page is driven through its whole form with Material fields, which takes seconds on a busy machine.
jest.setTimeout(30_000);

describe('RecipeEditorPage', () => {
  let fixture: ComponentFixture<RecipeEditorPage>;
  let element: HTMLElement;

  const stable = () => fixture.whenStable();
  const shown = (testId: string) => element.querySelector(`[data-testid="${testId}"]`)?.textContent?.trim();
  const button = (text: string) => [...element.querySelectorAll('button')].find((b) => b.textContent?.trim().endsWith(text))!;

  async function type(input: HTMLInputElement, value: string): Promise<void> {
    input.value = value;
    input.dispatchEvent(new Event('input'));
    await stable();
  }

  async function choose(field: Element, optionText: string): Promise<void> {
    field.querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
    await stable();
    const panel = document.getElementById(field.getAttribute('aria-controls')!)!;
    const option = [...panel.querySelectorAll<HTMLElement>('mat-option')].find((each) => each.textContent?.includes(optionText));
    option!.click();
    await stable();
  }

  const lastRow = (group: string) => [...element.querySelectorAll(`[role="group"][aria-label^="${group}"]`)].at(-1)!;

  describe('driven through its form with the real store', () => {
    beforeEach(async () => {
      TestBed.configureTestingModule({
        imports: [RecipeEditorPage],
        providers: [provideRouter([]), provideStore(), provideState(authFeature), provideState(recipesFeature), provideState(catalogueFeature), provideState(unsavedEditsFeature)],
      });
      const store = TestBed.inject(Store);
      store.dispatch(CatalogueApiActions.catalogueLoadedSuccess({ catalogue }));
      store.dispatch(CatalogueApiActions.brewhouseLoadedSuccess({ settings: MOCK_BREWHOUSE }));
      fixture = TestBed.createComponent(RecipeEditorPage);
      element = fixture.nativeElement as HTMLElement;
      await stable();
    });

    async function addFermentable(name: string, kg: string): Promise<void> {
      button('Add fermentable').click();
      await stable();
      const row = lastRow('Fermentable');
      await choose(row.querySelector('mat-select')!, name);
      await type(row.querySelector<HTMLInputElement>('input[formcontrolname="amount"]')!, kg);
    }

    async function addHop(name: string, grams: string, minutes: string): Promise<void> {
      button('Add hop').click();
      await stable();
      const row = lastRow('Hop addition');
      await choose(row.querySelector('mat-select[formcontrolname="hopId"]')!, name);
      await type(row.querySelector<HTMLInputElement>('input[formcontrolname="amount"]')!, grams);
      await type(row.querySelector<HTMLInputElement>('input[formcontrolname="time"]')!, minutes);
    }

    it('shows the same OG, FG, both ABV figures, IBU, colour and BU:GU as predictRecipe for the recipe typed', async () => {
      await type(element.querySelector<HTMLInputElement>('input[formcontrolname="name"]')!, 'Typed pale');
      await addFermentable('Pale base malt', '4.2');
      await addFermentable('Medium crystal malt', '0.3');
      await addHop('Bittering pellet hop', '20', '60');
      await choose(element.querySelector('mat-select[formcontrolname="yeastId"]')!, 'Clean ale yeast');

      const design: RecipeDesign = {
        ...emptyDesign(),
        name: 'Typed pale',
        fermentables: [{ fermentableId: 1, amountKg: 4.2 }, { fermentableId: 2, amountKg: 0.3 }],
        hops: [{ hopId: 11, amountGrams: 20, time: 60, use: 'boil' }],
        yeastId: 21,
      };
      const expected = predictRecipe(design, catalogue, MOCK_BREWHOUSE);
      const f = (value: number | null, digits: string) => formatNumber(value!, 'en-US', digits);
      expect(shown('prediction-og')).toBe(f(expected.og, '1.3-3'));
      expect(shown('prediction-fg')).toBe(f(expected.fg, '1.3-3'));
      expect(shown('prediction-abv-estimate')).toBe(`${f(expected.abvEstimate, '1.1-1')} %`);
      expect(shown('prediction-abv-density')).toBe(`${f(expected.abvDensityBased, '1.1-1')} %`);
      expect(shown('prediction-ibu')).toBe(f(expected.ibu, '1.0-0'));
      expect(shown('prediction-colour')).toBe(`${f(expected.colourSrm, '1.1-1')} SRM · ${f(expected.colourEbc, '1.0-0')} EBC`);
      expect(shown('prediction-bugu')).toBe(f(expected.buGu, '1.2-2'));
      expect(shown('water-strike')).toBe(`${f(expected.waterPlan!.strikeLitres, '1.1-1')} L`);
    });

    it('raises IBU as soon as a hop is added and OG as soon as sugar is added', async () => {
      await addFermentable('Pale base malt', '4');
      await addHop('Bittering pellet hop', '20', '60');
      const before = [shown('prediction-og'), shown('prediction-ibu')];

      await addHop('Aroma whole hop', '30', '15');

      expect(Number(shown('prediction-ibu'))).toBeGreaterThan(Number(before[1]));
      await addFermentable('Cane sugar', '0.5');
      expect(Number(shown('prediction-og'))).toBeGreaterThan(Number(before[0]));
    });

    it('shows what is typed in US units after the switch, with the same OG', async () => {
      await addFermentable('Pale base malt', '4.2');
      const og = shown('prediction-og');

      [...element.querySelectorAll<HTMLButtonElement>('mat-button-toggle button')].find((b) => b.textContent?.includes('US'))!.click();
      await stable();

      expect(element.querySelector<HTMLInputElement>('input[formcontrolname="batchVolume"]')!.value).toBe('5.283');
      expect(lastRow('Fermentable').querySelector<HTMLInputElement>('input[formcontrolname="amount"]')!.value).toBe('9.259');
      expect(shown('prediction-og')).toBe(og);
    });

    it('refuses at the field a batch larger than the API stores', async () => {
      const input = element.querySelector<HTMLInputElement>('input[formcontrolname="batchVolume"]')!;
      await type(input, '2500');
      input.dispatchEvent(new Event('blur'));
      await stable();

      expect(element.querySelector('mat-error')?.textContent).toContain('Between 0.5 and 2000.');
    });

    it('shows the message at the field and saves nothing when the batch volume is cleared', async () => {
      const store = TestBed.inject(Store);
      jest.spyOn(store, 'dispatch');
      await type(element.querySelector<HTMLInputElement>('input[formcontrolname="batchVolume"]')!, '');

      button('Save').click();
      await stable();

      expect(element.textContent).toContain('Enter the volume into the fermenter.');
      expect(store.dispatch).not.toHaveBeenCalledWith(expect.objectContaining({ type: RecipeEditorPageActions.saveSubmitted.type }));
    });
  });

  describe('with a mock store', () => {
    let store: MockStore;

    beforeEach(() => {
      TestBed.configureTestingModule({
        imports: [RecipeEditorPage],
        providers: [
          provideRouter([]),
          provideMockStore({
            initialState: {
              auth: initialAuthState,
              recipes: { ...recipesFeature.reducer(undefined, { type: 'init' }), current: generateMockRecipe({ editable: false, ownerName: 'Jonah Weiss' }) },
              catalogue: catalogueFeature.reducer(undefined, { type: 'init' }),
              unsavedEdits: initialUnsavedEditsState,
            },
          }),
        ],
      });
      store = TestBed.inject(MockStore);
      jest.spyOn(store, 'dispatch');
      fixture = TestBed.createComponent(RecipeEditorPage);
      element = fixture.nativeElement as HTMLElement;
    });

    it('dispatches Existing Opened with the id from the route', async () => {
      fixture.componentRef.setInput('recipeId', '41');
      await stable();

      expect(store.dispatch).toHaveBeenCalledWith(RecipeEditorPageActions.existingOpened({ recipeId: 41 }));
    });

    it('shows someone else’s recipe read-only, with Clone but without Save, Share or Archive', async () => {
      fixture.componentRef.setInput('recipeId', '41');
      await stable();

      expect(element.querySelector('h1')?.textContent).toContain('Fernhollow pale');
      expect(element.textContent).toContain('only its owner edits it');
      expect(button('Clone')).toBeDefined();
      expect([...element.querySelectorAll('button')].some((b) => b.textContent?.trim() === 'Save')).toBe(false);
      expect(element.querySelector('mat-slide-toggle')).toBeNull();
      expect(element.querySelector<HTMLInputElement>('input[formcontrolname="name"]')!.disabled).toBe(true);
    });

    it('lets an admin archive someone else’s recipe', async () => {
      store.overrideSelector(authFeature.selectIsAdmin, true);
      fixture.componentRef.setInput('recipeId', '41');
      await stable();

      button('Archive').click();

      expect(store.dispatch).toHaveBeenCalledWith(RecipeEditorPageActions.archiveToggled({ recipeId: 41, archived: true }));
    });
  });
});
