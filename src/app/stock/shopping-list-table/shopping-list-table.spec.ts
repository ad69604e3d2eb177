import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { ShoppingListTable } from './shopping-list-table';

describe('ShoppingListTable', () => {
  async function emptyText(batchCount: number): Promise<string> {
    TestBed.configureTestingModule({ providers: [provideRouter([])] });
    const fixture = TestBed.createComponent(ShoppingListTable);
    fixture.componentRef.setInput('lines', []);
    fixture.componentRef.setInput('batchCount', batchCount);
    await fixture.whenStable();
    return (fixture.nativeElement as HTMLElement).querySelector('tbody')!.textContent!.trim();
  }

  it('says no batch is planned when the horizon holds none, not that stock covers them', async () => {
    expect(await emptyText(0)).toBe('No batch is planned to brew in these days.');
  });

  it('says stock covers the planned batches when there are some and nothing is short', async () => {
    expect(await emptyText(2)).toBe('Stock covers every planned batch in these days.');
  });
});
