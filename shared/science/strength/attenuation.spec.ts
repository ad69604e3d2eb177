import { apparentAttenuation, realAttenuation } from './attenuation';
import { ScienceRangeError } from '../units/science-range-error';

describe('attenuation', () => {
  // Definition (common practice): (OE − E)/OE × 100. 12 → 3 °P is 75 %.
  it('gives 75 % apparent attenuation from 12 °P to 3 °P', () => {
    expect(apparentAttenuation(12, 3)).toBeCloseTo(75, 12);
  });

  it('gives 50 % real attenuation from 12 °P to 6 °P', () => {
    expect(realAttenuation(12, 6)).toBeCloseTo(50, 12);
  });

  it('accepts a negative apparent extract (dry beer reads below 0 °P)', () => {
    expect(apparentAttenuation(10, -0.5)).toBeCloseTo(105, 12);
  });

  it('throws an inconsistent error when the later extract is above the original', () => {
    expect(() => apparentAttenuation(10, 11)).toThrow(ScienceRangeError);
  });
});
