import { Actions } from '@ngrx/effects';
import { Action } from '@ngrx/store';
import { firstValueFrom, Observable, of } from 'rxjs';
import { CatalogueImportResult, generateMockCatalogue } from '@shared/recipes';
import { CatalogueClient } from '../catalogue-client';
import { CatalogueApiActions } from './catalogue-api.actions';
import { CataloguePageActions } from './catalogue-page.actions';
import { RecipeEditorPageActions } from '@app/recipes/state/recipe-editor-page.actions';
import { saveEntry } from './catalogue-entries.effects';
import { commitImport, previewImport } from './catalogue-import.effects';
import { loadCatalogue } from './catalogue-loads.effects';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const fakeClient = (overrides: Partial<Record<keyof CatalogueClient, (...args: never[]) => Observable<unknown>>>) => overrides as unknown as CatalogueClient;
const result: CatalogueImportResult = { kind: 'hops', rows: [{ name: 'Hop A', alphaAcidPercent: 5, form: 'pellet' }], problems: [], imported: 0 };

describe('catalogue effects', () => {
  it('loadCatalogue loads retired entries too when the editor opens, so old recipes still resolve', async () => {
    const catalogue = generateMockCatalogue();
    const client = fakeClient({ catalogue: jest.fn(() => of(catalogue)) });

    const action = await firstValueFrom(loadCatalogue(actionsOf(RecipeEditorPageActions.existingOpened({ recipeId: 41 })), client));

    expect(client.catalogue).toHaveBeenCalledWith(true);
    expect(action).toEqual(CatalogueApiActions.catalogueLoadedSuccess({ catalogue }));
  });

  it('previewImport sends the file with commit false and keeps the file for the confirmation', async () => {
    const client = fakeClient({ importCsv: jest.fn(() => of(result)) });

    const action = await firstValueFrom(previewImport(actionsOf(CataloguePageActions.importPreviewRequested({ kind: 'hops', csv: 'name\n' })), client));

    expect(client.importCsv).toHaveBeenCalledWith('hops', { csv: 'name\n', commit: false });
    expect(action).toEqual(CatalogueApiActions.importPreviewedSuccess({ csv: 'name\n', result }));
  });

  it('commitImport sends the same file with commit true', async () => {
    const client = fakeClient({ importCsv: jest.fn(() => of({ ...result, imported: 1 })) });

    const action = await firstValueFrom(commitImport(actionsOf(CataloguePageActions.importConfirmed({ kind: 'hops', csv: 'name\n' })), client));

    expect(client.importCsv).toHaveBeenCalledWith('hops', { csv: 'name\n', commit: true });
    expect(action).toEqual(CatalogueApiActions.importCommittedSuccess({ result: { ...result, imported: 1 } }));
  });

  it('saveEntry retires an entry by PATCH with retired only', async () => {
    const hop = { id: 5, name: 'Hop A', alphaAcidPercent: 5, form: 'pellet' as const, retired: true };
    const client = fakeClient({ changeEntry: jest.fn(() => of(hop)) });

    const action = await firstValueFrom(saveEntry(actionsOf(CataloguePageActions.entryRetiredChanged({ kind: 'hops', id: 5, retired: true })), client));

    expect(client.changeEntry).toHaveBeenCalledWith('hops', 5, { retired: true });
    expect(action).toEqual(CatalogueApiActions.entrySavedSuccess({ kind: 'hops', entry: hop }));
  });
});
