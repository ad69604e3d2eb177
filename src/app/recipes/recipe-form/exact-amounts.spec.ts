import { FormControl } from '@angular/forms';
import { ExactAmounts } from './exact-amounts';

describe('ExactAmounts', () => {
  it('gives back the stored value while the field shows what it was given', () => {
    const exact = new ExactAmounts();
    const field = new FormControl<number | null>(11.023);
    exact.remember(field, 5);

    expect(exact.si(field, 4.99999)).toBe(5);
  });

  it('takes the converted typed value once the person changes the field', () => {
    const exact = new ExactAmounts();
    const field = new FormControl<number | null>(11.023);
    exact.remember(field, 5);

    field.setValue(12);

    expect(exact.si(field, 5.443)).toBe(5.443);
  });
});
