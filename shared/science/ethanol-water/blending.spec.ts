import { blendToTarget, dilutionWithWater, ethanolVolumeInStock } from './blending';
import { ScienceRangeError } from '../units/science-range-error';

describe('dilutionWithWater', () => {
  // By the definition of % vol at 20 °C the ethanol volume at 20 °C is conserved: 1 L at 96 % → 96/40 = 2.4 L at 40 %.
  it('ends at 2.4 L when 1 L of 96 % vol is cut to 40 % vol', () => {
    expect(dilutionWithWater(1, 96, 40).finalVolume).toBeCloseTo(2.4, 6);
  });

  it('needs more water than the naive 1.4 L because the mix contracts', () => {
    const plan = dilutionWithWater(1, 96, 40);
    expect(plan.addedVolume).toBeGreaterThan(1.4);
    expect(plan.contractionVolume).toBeGreaterThan(0);
  });

  it('throws when the target is above the stock', () => {
    expect(() => dilutionWithWater(1, 40, 50)).toThrow(ScienceRangeError);
  });
});

describe('blendToTarget', () => {
  it('conserves ethanol volume when two mixtures are blended', () => {
    const plan = blendToTarget(2, 60, 20, 40);
    const ethanolIn = ethanolVolumeInStock(2, 60) + ethanolVolumeInStock(plan.addedVolume, 20);
    expect(ethanolIn).toBeCloseTo((plan.finalVolume * 40) / 100, 9);
  });
});
