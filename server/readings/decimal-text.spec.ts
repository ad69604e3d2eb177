import { numberOfDecimal } from './decimal-text';

describe('numberOfDecimal', () => {
  it('reads every value of the gravity columns exactly as Number() does (DECIMAL(7,5) over 0–2, DECIMAL(9,4) over 0–1100)', () => {
    // Exactness follows from IEEE 754 division being correctly rounded (Clinger 1990, the exact fast case);
    // the sweep checks it against the engine's own reading of the same text.
    for (let m = 0; m <= 200_000; m++) {
      const text = `${Math.floor(m / 100_000)}.${String(m % 100_000).padStart(5, '0')}`;
      if (numberOfDecimal(text) !== Number(text)) throw new Error(`${text}: ${numberOfDecimal(text)} ≠ ${Number(text)}`);
    }
    for (let m = 0; m <= 11_000_000; m += 97) {
      const text = `${Math.floor(m / 10_000)}.${String(m % 10_000).padStart(4, '0')}`;
      if (numberOfDecimal(text) !== Number(text)) throw new Error(`${text}: ${numberOfDecimal(text)} ≠ ${Number(text)}`);
    }
    expect(numberOfDecimal('1.04790')).toBe(1.0479);
  });

  it('reads signs, whole numbers and text outside the fast case as Number() does', () => {
    expect(numberOfDecimal('-12.50')).toBe(-12.5);
    expect(Object.is(numberOfDecimal('-0.00'), -0)).toBe(true);
    expect(numberOfDecimal('1015')).toBe(1015);
    expect(numberOfDecimal('12345678901234567890.5')).toBe(Number('12345678901234567890.5'));
    expect(numberOfDecimal('1e3')).toBe(1000);
    expect(numberOfDecimal('.')).toBeNaN();
  });
});
