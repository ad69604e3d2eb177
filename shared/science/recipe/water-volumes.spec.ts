import { brewhouseVolumes } from './water-volumes';

describe('brewhouseVolumes', () => {
  // Hand-worked bookkeeping (common practice): 20 L batch + 1 L fermenter loss = 21 L; + 1 L kettle loss,
  // ÷ 0.96 for cooling = 22.917 L post-boil; + 3 L boil-off = 25.917 L pre-boil; + 5 kg × 1 L/kg = 30.917 L.
  const settings = {
    batchLitres: 20, grainKilograms: 5, boilMinutes: 60, boilOffLitresPerHour: 3,
    grainAbsorptionLitresPerKg: 1, kettleLossLitres: 1, fermenterLossLitres: 1, mashRatioLitresPerKg: 3, coolingShrinkagePercent: 4,
  };

  it('plans the hand-worked volumes', () => {
    const plan = brewhouseVolumes(settings);
    expect(plan.postBoilLitres).toBeCloseTo(22.9167, 4);
    expect(plan.preBoilLitres).toBeCloseTo(25.9167, 4);
    expect(plan.totalWaterLitres).toBeCloseTo(30.9167, 4);
    expect(plan.strikeLitres).toBeCloseTo(15, 12);
    expect(plan.spargeLitres).toBeCloseTo(15.9167, 4);
  });

  // Extract conserved through the boil: 50 points × 22.917 / 25.917 = 44.21 points.
  it('gives pre-boil gravity 1.0442 for OG 1.050', () => {
    expect(brewhouseVolumes(settings, 1.05).preBoilGravity).toBeCloseTo(1.04421, 5);
  });

  it('flags a strike larger than all the water needed', () => {
    expect(brewhouseVolumes({ ...settings, grainKilograms: 12, mashRatioLitresPerKg: 4 }).strikeExceedsTotal).toBe(true);
  });

  it('throws for a negative boil-off', () => {
    expect(() => brewhouseVolumes({ ...settings, boilOffLitresPerHour: -1 })).toThrow(/boilOffLitresPerHour = -1 L\/h/);
  });
});
