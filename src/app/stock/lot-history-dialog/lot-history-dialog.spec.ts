import { TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA } from '@angular/material/dialog';
import { StockLot, StockMovement } from '@shared/stock';
import { LotHistoryDialog, LotHistoryDialogData } from './lot-history-dialog';

const lot: StockLot = {
  id: 5, ingredientId: 11, ingredientKind: 'fermentables', ingredientName: 'Demo pale malt', unit: 'kg', receivedQuantity: 3, onHand: 2.5,
  receivedOn: '2026-12-02', bestBefore: null, supplierNote: '', createdAt: '2026-12-02T11:41:47Z',
};
const movement = (id: number, change: number, onHandAfter: number, createdAt: string): StockMovement => ({
  id, lotId: 5, kind: id === 1 ? 'receipt' : 'adjustment', change, onHandAfter, batchId: null, batchName: null, reason: id === 1 ? null : 'spillage', note: '', byName: 'Demo Brewer', createdAt,
});

describe('LotHistoryDialog', () => {
  it("shows each movement's time on the co-op's clocks, whatever the browser's zone", async () => {
    const data: LotHistoryDialogData = {
      lot, unitSystem: 'metric', timeZone: 'Pacific/Auckland',
      movements: [movement(1, 3, 3, '2026-12-02T11:41:47Z'), movement(2, -0.5, 2.5, '2026-12-02T11:44:07Z')],
    };
    TestBed.configureTestingModule({ providers: [{ provide: MAT_DIALOG_DATA, useValue: data }] });
    const fixture = TestBed.createComponent(LotHistoryDialog);
    await fixture.whenStable();
    const text = (fixture.nativeElement as HTMLElement).textContent!;

    // Auckland keeps NZDT (UTC+13) in December: 11:44 UTC is 00:44 the next day there.
    expect(text).toContain('3 Dec 2026, 00:41 GMT+13');
    expect(text).toContain('3 Dec 2026, 00:44 GMT+13');
    expect(text).toContain('Adjusted −0.5 kg');
  });
});
