import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { DEFAULT_BREWHOUSE_SETTINGS, generateMockCatalogue } from '@shared/recipes';
import { CataloguePageActions } from '../state/catalogue-page.actions';
import { selectBrewhouseOrDefault, selectCataloguePageViewModel } from '../state/catalogue.selectors';
import { CataloguePage } from './catalogue-page';

describe('CataloguePage', () => {
  async function render(canEdit: boolean) {
    const catalogue = generateMockCatalogue();
    TestBed.configureTestingModule({
      imports: [CataloguePage],
      providers: [
        provideRouter([]),
        provideMockStore({
          selectors: [
            {
              selector: selectCataloguePageViewModel,
              value: {
                entries: catalogue,
                styles: [],
                brewhouse: null,
                canEdit,
                includeRetired: false,
                search: '',
                loading: false,
                loadError: null,
                saving: false,
                savedCount: 0,
                importPreview: null,
                importing: false,
              },
            },
            { selector: selectBrewhouseOrDefault, value: DEFAULT_BREWHOUSE_SETTINGS },
          ],
        }),
      ],
    });
    const store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
    const fixture = TestBed.createComponent(CataloguePage);
    await fixture.whenStable();
    return { store, element: fixture.nativeElement as HTMLElement };
  }

  it('dispatches Opened and lists the fermentables first', async () => {
    const { store, element } = await render(false);

    expect(store.dispatch).toHaveBeenCalledWith(CataloguePageActions.opened());
    expect([...element.querySelectorAll('tbody th')].map((th) => th.textContent?.trim())).toContain('Pale base malt');
  });

  it('offers a member no edit, retire, add or import', async () => {
    const { element } = await render(false);

    expect(element.querySelector('cw-catalogue-entry-form')).toBeNull();
    expect(element.textContent).not.toContain('Import from a CSV file');
    expect([...element.querySelectorAll('button')].some((b) => b.textContent?.trim() === 'Retire')).toBe(false);
  });

  it('asks where an entry is used before a brewer retires it', async () => {
    const { store, element } = await render(true);

    element.querySelector<HTMLButtonElement>('button[aria-label="Retire Pale base malt"]')!.click();

    expect(store.dispatch).toHaveBeenCalledWith(CataloguePageActions.usageRequested({ kind: 'fermentables', id: 1, name: 'Pale base malt', purpose: 'retire' }));
    expect(store.dispatch).not.toHaveBeenCalledWith(expect.objectContaining({ type: CataloguePageActions.entryRetiredChanged.type }));
    expect(element.textContent).toContain('Import from a CSV file');
  });
});
