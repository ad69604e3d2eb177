import { TestBed } from '@angular/core/testing';
import { FormGroup } from '@angular/forms';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { ReceiveLotDialog, ReceiveLotDialogData } from './receive-lot-dialog';

const data: ReceiveLotDialogData = {
  ingredients: [
    { ingredientId: 11, name: 'Demo pale malt', kind: 'fermentables' },
    { ingredientId: 12, name: 'Demo hop', kind: 'hops' },
  ],
  unitSystem: 'us',
  today: '2026-12-02',
};

describe('ReceiveLotDialog', () => {
  async function open() {
    const close = jest.fn();
    TestBed.configureTestingModule({ providers: [{ provide: MAT_DIALOG_DATA, useValue: data }, { provide: MatDialogRef, useValue: { close } }] });
    const fixture = TestBed.createComponent(ReceiveLotDialog);
    await fixture.whenStable();
    const form = (fixture.componentInstance as unknown as { form: FormGroup }).form;
    const submit = () => (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    return { fixture, form, close, submit };
  }

  it('offers pounds for malt in US units and closes with the quantity in kilograms', async () => {
    const { form, close, submit, fixture } = await open();
    form.controls['ingredientId'].setValue(11);
    await fixture.whenStable();
    form.controls['quantity'].setValue(2);
    form.controls['bestBefore'].setValue('2027-06-01');
    submit();

    // 1 lb = 0.45359237 kg exactly (international yard and pound agreement, 1959).
    expect(close).toHaveBeenCalledWith({ ingredientId: 11, unit: 'kg', quantity: 0.90718474, receivedOn: '2026-12-02', bestBefore: '2027-06-01', supplierNote: '' });
  });

  it.each([
    ['a quantity beyond the stock limit', 30_000, '2027-06-01'],
    ['a best-before before the delivery', 2, '2026-11-01'],
  ])('refuses %s', async (_case, quantity, bestBefore) => {
    const { form, close, submit, fixture } = await open();
    form.controls['ingredientId'].setValue(11);
    await fixture.whenStable();
    form.controls['quantity'].setValue(quantity);
    form.controls['bestBefore'].setValue(bestBefore);
    submit();

    expect(close).not.toHaveBeenCalled();
  });
});
