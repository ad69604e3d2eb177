import { tinsethIbu } from './bitterness';
import { hopStandIbu, isomerisationRateRelativeToBoil } from './hop-stand';

describe('isomerisationRateRelativeToBoil', () => {
  it('is 1 at the boil', () => {
    expect(isomerisationRateRelativeToBoil(100)).toBeCloseTo(1, 12);
  });

  // Malowicki (2005) fit, hand-worked: e^(−11858 × (1/353.15 − 1/373.15)) = e^(−1.7997) = 0.1653.
  it('gives 0.165 of the boil rate at 80 °C', () => {
    expect(isomerisationRateRelativeToBoil(80)).toBeCloseTo(0.1653, 4);
  });

  // Same fit: e^(−11858 × (1/363.15 − 1/373.15)) = e^(−0.8751) = 0.4168.
  it('gives 0.417 of the boil rate at 90 °C', () => {
    expect(isomerisationRateRelativeToBoil(90)).toBeCloseTo(0.4168, 4);
  });

  it('throws above the boil', () => {
    expect(() => isomerisationRateRelativeToBoil(101)).toThrow(/temperatureC = 101/);
  });
});

describe('hopStandIbu', () => {
  const addition = { grams: 40, alphaPercent: 10, minutes: 20 };

  it('equals Tinseth at 100 °C', () => {
    expect(hopStandIbu(addition, 1.05, 20, 100)).toBeCloseTo(tinsethIbu(addition, 1.05, 20), 12);
  });

  // Tinseth, hand-worked: U(1.050, 20 min) = 1.05278 × (1 − e^−0.8)/4.15 = 0.13975; 200 mg/L α → 27.95 IBU; × 0.1653 = 4.62.
  it('gives 4.62 IBU for a 20-minute stand at 80 °C', () => {
    expect(hopStandIbu(addition, 1.05, 20, 80)).toBeCloseTo(4.62, 2);
  });
});
