import { alcoholCorrectedGravity, sgFromRefractometer, wortCorrectionFactor } from './refractometer';
import { sgFromPlato } from './plato';

describe('refractometer', () => {
  it('divides the reading by the default wort correction factor 1.04 (common practice)', () => {
    expect(sgFromRefractometer(12.48)).toBeCloseTo(sgFromPlato(12), 12);
  });

  it('derives the factor from a paired hydrometer reading: 12.5 °Bx on a 12 °P wort gives 12.5/12', () => {
    expect(wortCorrectionFactor(12.5, sgFromPlato(12))).toBeCloseTo(12.5 / 12, 9);
  });

  // Terrill's cubic (2011), coefficients from memory; hand-worked at corrected OB 20, FB 10:
  // 1 − 0.089986 + 0.11774 + 0.110324 − 0.12717 − 0.05824 + 0.063293 = 1.015961.
  it('gives SG 1.01596 for 20.8 → 10.4 °Bx with factor 1.04 (hand-worked Terrill cubic)', () => {
    expect(alcoholCorrectedGravity(20.8, 10.4, 1.04)).toBeCloseTo(1.015961, 6);
  });

  it('throws when the current reading is above the original', () => {
    expect(() => alcoholCorrectedGravity(10, 12)).toThrow(/currentBrix = 12 °Bx must not be above originalBrix = 10 °Bx/);
  });
});
