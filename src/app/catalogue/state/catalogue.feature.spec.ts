import { CatalogueImportResult, generateMockCatalogue } from '@shared/recipes';
import { CatalogueApiActions } from './catalogue-api.actions';
import { CataloguePageActions } from './catalogue-page.actions';
import { catalogueFeature, initialCatalogueState } from './catalogue.feature';

const { reducer } = catalogueFeature;
const refused: CatalogueImportResult = { kind: 'hops', rows: [{ name: 'Hop A' }], problems: [{ line: 3, reason: 'alphaAcidPercent must be a number' }], imported: 0 };

describe('catalogueFeature reducer', () => {
  it('on Catalogue Loaded Success keeps every kind, sorted by name', () => {
    const state = reducer(initialCatalogueState, CatalogueApiActions.catalogueLoadedSuccess({ catalogue: generateMockCatalogue() }));

    expect(state.fermentables.ids).toEqual([3, 2, 4, 1]);
    expect(state.loaded).toBe(true);
  });

  it('keeps a refused import on screen with its problems after the commit', () => {
    const previewed = reducer(initialCatalogueState, CatalogueApiActions.importPreviewedSuccess({ csv: 'x', result: refused }));

    const committed = reducer(previewed, CatalogueApiActions.importCommittedSuccess({ result: refused }));

    expect(committed.importPreview?.result.problems).toEqual(refused.problems);
  });

  it('clears the preview once the file is imported', () => {
    const previewed = reducer(initialCatalogueState, CatalogueApiActions.importPreviewedSuccess({ csv: 'x', result: { ...refused, problems: [] } }));

    const committed = reducer(previewed, CatalogueApiActions.importCommittedSuccess({ result: { ...refused, problems: [], imported: 1 } }));

    expect(committed.importPreview).toBeNull();
  });

  it('on Entry Saved Success adds the entry and counts the save', () => {
    const hop = { id: 99, name: 'New hop', alphaAcidPercent: 7, form: 'pellet' as const, retired: false };

    const state = reducer(reducer(initialCatalogueState, CataloguePageActions.entryAdded({ kind: 'hops', input: hop })), CatalogueApiActions.entrySavedSuccess({ kind: 'hops', entry: hop }));

    expect([state.hops.entities[99], state.saving, state.savedCount]).toEqual([hop, false, 1]);
  });
});
