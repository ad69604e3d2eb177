import { TestBed } from '@angular/core/testing';
import { generateMockCatalogue } from '@shared/recipes';
import { CatalogueTable } from './catalogue-table';

describe('CatalogueTable', () => {
  const hops = [
    { ...generateMockCatalogue().hops[0], id: 1, name: 'Citrine', alphaAcidPercent: 12.5 },
    { ...generateMockCatalogue().hops[0], id: 2, name: 'Bramble', alphaAcidPercent: 4 },
    { ...generateMockCatalogue().hops[0], id: 3, name: 'Alder', alphaAcidPercent: 7.2 },
  ];

  async function render() {
    TestBed.configureTestingModule({ imports: [CatalogueTable] });
    const fixture = TestBed.createComponent(CatalogueTable);
    fixture.componentRef.setInput('kind', 'hops');
    fixture.componentRef.setInput('entries', hops);
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    const names = () => [...element.querySelectorAll('tbody th')].map((th) => th.textContent?.trim());
    const clickHeader = async (label: string) => {
      [...element.querySelectorAll<HTMLElement>('thead th')].find((th) => th.textContent?.trim() === label)!.querySelector<HTMLElement>('.mat-sort-header-container')!.click();
      await fixture.whenStable();
    };
    return { element, names, clickHeader };
  }

  it('lists entries by name, and sorts by a column when its header is clicked, numbers by size', async () => {
    const { names, clickHeader, element } = await render();
    expect(names()).toEqual(['Alder', 'Bramble', 'Citrine']);
    await clickHeader('Alpha acids');
    expect(names()).toEqual(['Bramble', 'Alder', 'Citrine']);
    expect([...element.querySelectorAll('thead th')].find((th) => th.textContent?.trim() === 'Alpha acids')?.getAttribute('aria-sort')).toBe('ascending');
    await clickHeader('Alpha acids');
    expect(names()).toEqual(['Citrine', 'Alder', 'Bramble']);
    await clickHeader('Name');
    expect(names()).toEqual(['Alder', 'Bramble', 'Citrine']);
  });
});
