import fc from 'fast-check';
import { platoFromSg, sgFromPlato } from './plato';
import { ScienceRangeError } from '../units/science-range-error';

// Density of sucrose solutions at 20 °C, CRC Handbook of Chemistry and Physics, "Concentrative
// properties of aqueous solutions" (sucrose), from memory: 10 % 1.0381, 20 % 1.0810,
// 30 % 1.1270, 40 % 1.1764 g/cm³. SG 20/20 = density / water at 20 °C (998.2067 kg/m³, Tanaka 2001).
const SUCROSE_TABLE: [number, number][] = [[10, 1038.1], [20, 1081.0], [30, 1127.0], [40, 1176.4]];

describe('platoFromSg', () => {
  it.each(SUCROSE_TABLE)('gives %p °P for the sucrose solution of density %p kg/m³ within 0.05 °P', (plato, density) => {
    expect(Math.abs(platoFromSg(density / 998.2067) - plato)).toBeLessThan(0.05);
  });

  it('gives 12 °P for SG 1.0484 within 0.02 °P (Plato table, 20/20 °C, from memory)', () => {
    expect(Math.abs(platoFromSg(1.0484) - 12)).toBeLessThan(0.02);
  });

  it('throws a ScienceRangeError above 40 °P', () => {
    expect(() => platoFromSg(1.25)).toThrow(ScienceRangeError);
  });
});

describe('sgFromPlato', () => {
  it('gives SG 1.0000 for 0 °P within 0.00003', () => {
    expect(Math.abs(sgFromPlato(0) - 1)).toBeLessThan(3e-5);
  });

  it('round-trips SG → °P → SG within 1e-9 over −3 to 40 °P', () => {
    fc.assert(fc.property(fc.double({ min: -3, max: 40, noNaN: true }), (plato) =>
      Math.abs(platoFromSg(sgFromPlato(plato)) - plato) < 1e-9));
  });

  it('rises with extract', () => {
    fc.assert(fc.property(fc.double({ min: -3, max: 39.9, noNaN: true }), (p) => sgFromPlato(p + 0.1) > sgFromPlato(p)));
  });

  it('throws when NaN', () => {
    expect(() => sgFromPlato(Number.NaN)).toThrow(/plato = NaN/);
  });
});
