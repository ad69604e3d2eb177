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
      existing: [],
      imported: 0,
      updated: 0,
      skipped: 0,
    });

    const lines = [...element.querySelectorAll('[data-testid="import-problems"] li')].map((li) => li.textContent?.trim());
    expect(lines).toEqual(['Line 3: alphaAcidPercent must be a number', 'Line 3: form must be one of pellet, whole, extract']);
    expect(importButton.disabled).toBe(true);
  });

  it('shows the rows and emits Confirmed when every row is valid', async () => {
    const { fixture, element, importButton } = await render({
      kind: 'hops',
      rows: [{ name: 'Hop A', alphaAcidPercent: 5, form: 'pellet' }],
      problems: [],
      existing: [],
      imported: 0,
      updated: 0,
      skipped: 0,
    });
    const confirmed = jest.fn();
    fixture.componentInstance.confirmed.subscribe(confirmed);

    importButton.click();

    expect(element.querySelector('tbody td')?.textContent).toBe('Hop A');
    expect(importButton.textContent?.trim()).toBe('Import 1 hops');
    expect(confirmed).toHaveBeenCalledWith([]);
  });

  it('skips each existing name until the brewer chooses to update it, and sends the choices', async () => {
    const { fixture, element, importButton } = await render({
      kind: 'hops',
      rows: [{ name: 'Hop A', alphaAcidPercent: 5, form: 'pellet' }, { name: 'Kept hop', alphaAcidPercent: 6, form: 'pellet' }, { name: 'Other hop', alphaAcidPercent: 7, form: 'pellet' }],
      problems: [],
      existing: [
        { line: 3, name: 'Kept hop', existingId: 7, existingName: 'Kept Hop' },
        { line: 4, name: 'Other hop', existingId: 8, existingName: 'Other hop' },
      ],
      imported: 0,
      updated: 0,
      skipped: 0,
    });
    const confirmed = jest.fn();
    fixture.componentInstance.confirmed.subscribe(confirmed);

    const update = [...element.querySelectorAll('[data-testid="import-existing"] li')][0].querySelectorAll('input[type="radio"]')[1] as HTMLInputElement;
    update.click();
    await fixture.whenStable();
    importButton.click();

    expect(importButton.textContent?.trim()).toBe('Import: add 1, update 1, skip 1');
    expect(confirmed).toHaveBeenCalledWith([{ line: 3, choice: 'update' }, { line: 4, choice: 'skip' }]);
  });
});
