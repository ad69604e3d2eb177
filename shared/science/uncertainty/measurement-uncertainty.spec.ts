import { propagate, resolutionUncertainty, toleranceVerdict } from './measurement-uncertainty';

describe('measurement uncertainty', () => {
  // GUM (JCGM 100:2008) 4.3.7: rectangular distribution of half-width a has u = a/√3; a = res/2.
  it('gives 0.000289 for a hydrometer read to 0.001', () => {
    expect(resolutionUncertainty(0.001)).toBeCloseTo(0.001 / Math.sqrt(12), 15);
  });

  // GUM eq. (10): for f = 2a + 3b with u(a) = u(b) = 1, u(f) = √(4 + 9).
  it('propagates through a linear function by the law of propagation', () => {
    const result = propagate(([a, b]) => 2 * a + 3 * b, [1, 1], [1, 1]);
    expect(result.standardUncertainty).toBeCloseTo(Math.sqrt(13), 6);
    expect(result.expandedUncertainty).toBeCloseTo(2 * Math.sqrt(13), 6);
  });

  it('says within, outside or undecided for a declared figure', () => {
    const measured = { value: 5.3, standardUncertainty: 0.05, expandedUncertainty: 0.1 };
    expect(toleranceVerdict(5.0, measured, 0.5)).toBe('within');
    expect(toleranceVerdict(4.0, measured, 0.5)).toBe('outside');
    expect(toleranceVerdict(4.75, measured, 0.5)).toBe('undecided');
  });
});
