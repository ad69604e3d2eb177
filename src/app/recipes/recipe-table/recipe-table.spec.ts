import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { generateMockRecipe } from '@app/testing/recipe-mock';
import { RecipeListRow, RecipeTable } from './recipe-table';

function row(overrides: Partial<RecipeListRow>): RecipeListRow {
  const { design: _design, editable: _editable, createdAt: _createdAt, ...summary } = generateMockRecipe();
  return { ...summary, styleName: null, batchVolume: '20 L', ...overrides };
}

describe('RecipeTable', () => {
  let fixture: ComponentFixture<RecipeTable>;
  let element: HTMLElement;

  async function render(recipes: RecipeListRow[], search = '', timeZone = 'UTC'): Promise<void> {
    TestBed.configureTestingModule({ imports: [RecipeTable], providers: [provideRouter([])] });
    fixture = TestBed.createComponent(RecipeTable);
    fixture.componentRef.setInput('recipes', recipes);
    fixture.componentRef.setInput('search', search);
    fixture.componentRef.setInput('timeZone', timeZone);
    element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  }

  const names = () => [...element.querySelectorAll('tbody th a')].map((a) => a.textContent?.trim());
  const header = (label: string) => [...element.querySelectorAll<HTMLButtonElement>('thead button')].find((b) => b.textContent?.includes(label))!;

  it('says that nothing matches a search that found no recipe', async () => {
    await render([], 'zzzz');

    expect(element.querySelector('tbody')?.textContent?.trim()).toBe('No recipes match “zzzz”. Try fewer or other words.');
  });

  it('says there are no recipes yet only when nothing was searched', async () => {
    await render([]);

    expect(element.querySelector('tbody')?.textContent).toContain('No recipes yet.');
  });

  it('sorts by a column on a click and the other way on a second click', async () => {
    await render([row({ id: 1, name: 'Mild', version: 3 }), row({ id: 2, name: 'amber', version: 12 }), row({ id: 3, name: 'Bitter', version: 1 })]);

    header('Name').click();
    await fixture.whenStable();
    expect(names()).toEqual(['amber', 'Bitter', 'Mild']);
    expect(header('Name').closest('th')?.getAttribute('aria-sort')).toBe('ascending');

    header('Version').click();
    header('Version').click();
    await fixture.whenStable();
    expect(names()).toEqual(['amber', 'Mild', 'Bitter']);
  });

  // IANA tz database: Europe/Berlin is UTC+1 in December (CET); 23:30 UTC is already the next day there.
  it('shows when each recipe changed as date and time in the co-op zone', async () => {
    await render([row({ updatedAt: '2026-12-01T23:30:00.000Z' })], '', 'Europe/Berlin');

    expect(element.querySelector('[data-testid="recipe-changed"]')?.textContent?.trim()).toBe('2 Dec 2026, 00:30 CET');
  });
});
