import { TestBed } from '@angular/core/testing';
import { CatalogueImportResult } from '@shared/recipes';
import { CsvImportPreview } from './csv-import-preview';

describe('CsvImportPreview', () => {
  async function render(result: CatalogueImportResult) {
    const fixture = TestBed.createComponent(CsvImportPreview);
    fixture.componentRef.setInput('result', result);
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    const importButton = [...element.querySelectorAll('button')].find((b) => b.textContent?.includes('Import'))!;
    return { fixture, element, importButton };
  }

  it('lists every bad row by its line with the reason, and offers no import', async () => {
    const { element, importButton } = await render({
      kind: 'hops',
      rows: [{ name: 'Hop A', alphaAcidPercent: 5, form: 'pellet' }, { name: 'Hop B', alphaAcidPercent: null, form: 'cone' }],
      problems: [{ line: 3, reason: 'alphaAcidPercent must be a number' }, { line: 3, reason: 'form must be one of pellet, whole, extract' }],
      imported: 0,
    });

    const lines = [...element.querySelectorAll('[data-testid="import-problems"] li')].map((li) => li.textContent?.trim());
    expect(lines).toEqual(['Line 3: alphaAcidPercent must be a number', 'Line 3: form must be one of pellet, whole, extract']);
    expect(importButton.disabled).toBe(true);
  });

  it('shows the rows and emits Confirmed when every row is valid', async () => {
    const { fixture, element, importButton } = await render({ kind: 'hops', rows: [{ name: 'Hop A', alphaAcidPercent: 5, form: 'pellet' }], problems: [], imported: 0 });
    const confirmed = jest.fn();
    fixture.componentInstance.confirmed.subscribe(confirmed);

    importButton.click();

    expect(element.querySelector('tbody td')?.textContent).toBe('Hop A');
    expect(importButton.textContent?.trim()).toBe('Import 1 hops');
    expect(confirmed).toHaveBeenCalled();
  });
});
