import fc from 'fast-check';
import { redlichKisterBasis, redlichKisterExcessVolume } from './redlich-kister';

describe('Redlich–Kister expansion', () => {
  it('vanishes at both pure ends for any coefficients', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: 1, maxLength: 12 }), (c) =>
      redlichKisterExcessVolume(0, c) === 0 && Math.abs(redlichKisterExcessVolume(1, c)) < 1e-12));
  });

  // Legendre polynomials: L2(u) = (3u² − 1)/2, so at x = 0.75 (u = 0.5): x(1−x)·L2 = 0.1875 × (−0.125).
  it('uses Legendre terms: the third basis value at x = 0.75 is −0.0234375', () => {
    expect(redlichKisterBasis(0.75, 2)[2]).toBeCloseTo(-0.0234375, 12);
  });

  it('gives the one-term form A0·x(1−x) for a single coefficient', () => {
    expect(redlichKisterExcessVolume(0.3, [-4])).toBeCloseTo(-4 * 0.3 * 0.7, 12);
  });
});
