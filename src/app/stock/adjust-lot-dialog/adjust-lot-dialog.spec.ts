import { TestBed } from '@angular/core/testing';
import { FormGroup } from '@angular/forms';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { StockLot } from '@shared/stock';
import { AdjustLotDialog, AdjustLotDialogData } from './adjust-lot-dialog';

// A salt counted in kg, so both g and kg can be typed.
const lot: StockLot = {
  id: 5, ingredientId: 11, ingredientKind: 'others', ingredientName: 'Demo gypsum', unit: 'kg', receivedQuantity: 3, onHand: 3,
  receivedOn: '2026-12-02', bestBefore: null, supplierNote: '', createdAt: '2026-12-02T10:00:00Z',
};
const data: AdjustLotDialogData = { lot, unitSystem: 'metric' };

describe('AdjustLotDialog', () => {
  async function open() {
    const close = jest.fn();
    TestBed.configureTestingModule({ providers: [{ provide: MAT_DIALOG_DATA, useValue: data }, { provide: MatDialogRef, useValue: { close } }] });
    const fixture = TestBed.createComponent(AdjustLotDialog);
    await fixture.whenStable();
    const form = (fixture.componentInstance as unknown as { form: FormGroup }).form;
    const submit = async () => {
      (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
      await fixture.whenStable();
    };
    return { fixture, form, close, submit };
  }

  it('keeps the dialog open, naming what the lot holds, when spillage would take out more than is on hand', async () => {
    const { form, close, submit, fixture } = await open();
    form.patchValue({ reason: 'spillage', amount: 5, entryUnit: 'kg' });
    await submit();

    expect(close).not.toHaveBeenCalled();
    expect((fixture.nativeElement as HTMLElement).textContent).toContain('The lot holds 3 kg; take out at most that.');
  });

  it('takes out with a negative change under "Other", with its note', async () => {
    const { form, close, submit } = await open();
    form.patchValue({ reason: 'other', amount: -500, entryUnit: 'g', note: 'Sample for the tasting' });
    await submit();

    // 500 g = 0.5 kg (SI prefixes).
    expect(close).toHaveBeenCalledWith({ reason: 'other', change: -0.5, note: 'Sample for the tasting' });
  });

  it('lets spillage take out exactly what is on hand', async () => {
    const { form, close, submit } = await open();
    form.patchValue({ reason: 'spillage', amount: 3000, entryUnit: 'g' });
    await submit();

    expect(close).toHaveBeenCalledWith({ reason: 'spillage', change: -3, note: '' });
  });
});
