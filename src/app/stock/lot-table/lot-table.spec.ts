import { ComponentFixture, TestBed } from '@angular/core/testing';
import { StockLot } from '@shared/stock';
import { LotTable } from './lot-table';

const lot = (overrides: Partial<StockLot>): StockLot => ({
  id: 1, ingredientId: 10, ingredientKind: 'fermentables', ingredientName: 'Demo pale malt', unit: 'kg', receivedQuantity: 25, onHand: 20,
  receivedOn: '2026-10-01', bestBefore: '2027-06-01', supplierNote: 'Demo supplier', createdAt: '2026-10-01T08:00:00Z', ...overrides,
});

describe('LotTable', () => {
  let fixture: ComponentFixture<LotTable>;

  async function render(lots: StockLot[], inputs: Record<string, unknown> = {}): Promise<HTMLElement> {
    fixture = TestBed.createComponent(LotTable);
    fixture.componentRef.setInput('lots', lots);
    for (const [name, value] of Object.entries(inputs)) fixture.componentRef.setInput(name, value);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  const names = (element: HTMLElement) => [...element.querySelectorAll('tbody th')].map((th) => th.firstChild?.textContent?.trim());

  it('lists lots earliest best-before first and re-sorts on a header click', async () => {
    const element = await render([lot({ id: 1, ingredientName: 'Malt B', bestBefore: '2027-06-01' }), lot({ id: 2, ingredientName: 'Malt A', bestBefore: '2027-01-01' })]);
    expect(names(element)).toEqual(['Malt A', 'Malt B']);

    element.querySelector<HTMLButtonElement>('thead button')!.click();
    await fixture.whenStable();
    expect(element.querySelector('thead th')!.getAttribute('aria-sort')).toBe('ascending');
  });

  it('shows amounts in the person’s units, hops in ounces for US units', async () => {
    const element = await render([lot({ ingredientKind: 'hops', ingredientName: 'Demo hop', onHand: 0.028349523125, receivedQuantity: 0.056699046250 })], { unitSystem: 'us' });

    expect(element.querySelector('td[data-label="On hand"]')!.textContent).toContain('1 oz of 2 oz');
  });

  it('says nothing matched a search, and that there is no stock when there is none', async () => {
    expect((await render([], { filter: 'rye' })).textContent).toContain('No lots match “rye”.');
    expect((await render([], { filter: '' })).textContent).toContain('No stock recorded yet.');
  });

  it('offers adjustments only to people who keep the stock, and emits the lot', async () => {
    expect((await render([lot({})])).querySelector('button[aria-label^="Adjust"]')).toBeNull();
    const element = await render([lot({ id: 5 })], { mayKeep: true });
    const clicked: StockLot[] = [];
    fixture.componentInstance.adjustClicked.subscribe((l) => clicked.push(l));

    element.querySelector<HTMLButtonElement>('button[aria-label="Adjust lot 5 of Demo pale malt"]')!.click();

    expect(clicked.map((l) => l.id)).toEqual([5]);
  });
});
