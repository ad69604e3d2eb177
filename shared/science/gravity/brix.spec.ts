import fc from 'fast-check';
import { brixFromSg, sgFromBrix } from './brix';

describe('brix', () => {
  // CRC Handbook, sucrose solutions at 20 °C, from memory: 20 % by mass, 1.0810 g/cm³.
  it('gives 20 °Bx for a 20 % sucrose solution within 0.05 °Bx', () => {
    expect(Math.abs(brixFromSg(1081.0 / 998.2067) - 20)).toBeLessThan(0.05);
  });

  it('round-trips °Bx → SG → °Bx within 1e-9 over 0–40', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 40, noNaN: true }), (bx) => Math.abs(brixFromSg(sgFromBrix(bx)) - bx) < 1e-9));
  });

  it('throws for a negative °Bx', () => {
    expect(() => sgFromBrix(-1)).toThrow(/brix = -1 °Bx/);
  });
});
