import { TestBed } from '@angular/core/testing';
import { FormGroup } from '@angular/forms';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { DateTime } from 'luxon';
import { provideCoopDateAdapter } from '@app/ui/coop-date-formats';
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
    TestBed.configureTestingModule({ providers: [provideCoopDateAdapter(), { provide: MAT_DIALOG_DATA, useValue: data }, { provide: MatDialogRef, useValue: { close } }] });
    const fixture = TestBed.createComponent(ReceiveLotDialog);
    await fixture.whenStable();
    const form = (fixture.componentInstance as unknown as { form: FormGroup }).form;
    const typeInto = (label: string, text: string) => {
      const field = [...(fixture.nativeElement as HTMLElement).querySelectorAll('mat-form-field')].find((f) => f.querySelector('mat-label')?.textContent?.trim() === label)!;
      const input = field.querySelector('input')!;
      input.value = text;
      input.dispatchEvent(new Event('input'));
      input.dispatchEvent(new Event('blur'));
    };
    const submit = () => (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    return { fixture, form, close, submit, typeInto };
  }

  it('offers pounds for malt in US units and closes with the quantity in kilograms', async () => {
    const { form, close, submit, fixture } = await open();
    form.controls['ingredientId'].setValue(11);
    await fixture.whenStable();
    form.controls['quantity'].setValue(2);
    form.controls['bestBefore'].setValue(DateTime.fromISO('2027-06-01'));
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
    form.controls['bestBefore'].setValue(DateTime.fromISO(bestBefore));
    submit();

    expect(close).not.toHaveBeenCalled();
  });

  it('reads a typed best-before as yyyy-MM-dd: 2027-04-03 is 3 April', async () => {
    const { form, close, submit, fixture, typeInto } = await open();
    form.controls['ingredientId'].setValue(11);
    await fixture.whenStable();
    form.controls['quantity'].setValue(2);
    typeInto('Best before', '2027-04-03');
    submit();

    expect(close).toHaveBeenCalledWith(expect.objectContaining({ receivedOn: '2026-12-02', bestBefore: '2027-04-03' }));
  });

  it('refuses a day typed as 03/04/2027, which reads as March in one country and April in another', async () => {
    const { form, close, submit, fixture, typeInto } = await open();
    form.controls['ingredientId'].setValue(11);
    await fixture.whenStable();
    form.controls['quantity'].setValue(2);
    typeInto('Best before', '03/04/2027');
    submit();
    await fixture.whenStable();

    expect(close).not.toHaveBeenCalled();
    expect((fixture.nativeElement as HTMLElement).textContent).toContain('Give the day as yyyy-MM-dd.');
  });
});
