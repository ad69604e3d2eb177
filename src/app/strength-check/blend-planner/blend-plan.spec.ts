import { blendPlanOrReason } from './blend-plan';

describe('blendPlanOrReason', () => {
  // Common practice: 40 mL of ethanol and 60 mL of water make about 96.7 mL at 20 °C, not 100 mL.
  it('shows the contraction of 40 mL ethanol and 60 mL water', () => {
    const plan = blendPlanOrReason({ mode: 'mix', first: 40, second: 60, target: null, addition: null, temperature: 20 });
    if (typeof plan === 'string') throw new Error(plan);
    expect(plan.finalVolume).toBeCloseTo(96.7, 1);
    expect(plan.contractionVolume).toBeCloseTo(3.3, 1);
  });

  // Mass balance on ethanol: halving 40 % vol to 20 % vol needs a little over an equal volume of water, as the mix contracts.
  it('plans a dilution with water and its final volume', () => {
    const plan = blendPlanOrReason({ mode: 'dilute', first: 1, second: 40, target: 20, addition: null, temperature: 20 });
    if (typeof plan === 'string') throw new Error(plan);
    expect(plan.added).toBeGreaterThan(1);
    expect(plan.finalVolume).toBeCloseTo(2, 3);
  });

  it('says what is missing', () => {
    expect(blendPlanOrReason({ mode: 'blend', first: 1, second: 40, target: 30, addition: null, temperature: 20 })).toBe('Fill in every field.');
  });

  it('explains a target that cannot be reached', () => {
    expect(blendPlanOrReason({ mode: 'dilute', first: 1, second: 20, target: 30, addition: null, temperature: 20 })).toMatch(/^Out of range/);
  });
});
