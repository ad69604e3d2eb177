import { OIML_A, OIML_B, OIML_C } from './oiml-coefficients';

describe('OIML R 22 coefficients', () => {
  // Council Directive 76/766/EEC, Annex, "Numerical coefficients in the formula" (the OIML R 22
  // equation): A1 = 9.982 012 300·10², A2 = −1.929 769 495·10², A3 = 3.891 238 958·10²,
  // A4 = −1.668 103 923·10³; B1 = −2.061 851 3·10⁻¹, B2 = −5.268 254 2·10⁻³, B3 = 3.613 001 3·10⁻⁵.
  it('match the printed leading coefficients digit for digit', () => {
    expect(OIML_A.slice(0, 4)).toEqual([998.20123, -192.9769495, 389.1238958, -1668.103923]);
    expect(OIML_B.slice(0, 3)).toEqual([-2.0618513e-1, -5.2682542e-3, 3.6130013e-5]);
  });

  // Same annex: n = 5 temperature powers with m = 11, 10, 9, 4, 2 mass-fraction terms each.
  it('have the published shape: 12 A, 6 B and C rows of 11, 10, 9, 4 and 2 terms', () => {
    expect(OIML_A).toHaveLength(12);
    expect(OIML_B).toHaveLength(6);
    expect(OIML_C.map((row) => row.length)).toEqual([11, 10, 9, 4, 2]);
  });
});
