import { convertBetweenSystems, fromDisplayUnits, shownAmountText, toDisplayUnits, unitLabel } from './recipe-units';

// Exact definitions (NIST Handbook 44, appendix C): 1 lb = 0.45359237 kg, 1 US gal = 3.785411784 L, °F = °C × 1.8 + 32.
describe('recipe units', () => {
  it('toDisplayUnits leaves metric amounts as stored', () => {
    expect(toDisplayUnits('grain-mass', 4.5, 'metric')).toBe(4.5);
  });

  it('toDisplayUnits shows 0.45359237 kg as 1 lb and 3.785411784 L as 1 gal', () => {
    expect(toDisplayUnits('grain-mass', 0.45359237, 'us')).toBeCloseTo(1, 12);
    expect(toDisplayUnits('volume', 3.785411784, 'us')).toBeCloseTo(1, 12);
  });

  it('toDisplayUnits shows 28.349523125 g as 1 oz and 67 °C as 152.6 °F', () => {
    expect(toDisplayUnits('hop-mass', 28.349523125, 'us')).toBeCloseTo(1, 12);
    expect(toDisplayUnits('temperature', 67, 'us')).toBeCloseTo(152.6, 10);
  });

  it('fromDisplayUnits turns 5 gal into 18.92705892 L and 152 °F into 66.67 °C', () => {
    expect(fromDisplayUnits('volume', 5, 'us')).toBeCloseTo(18.92705892, 9);
    expect(fromDisplayUnits('temperature', 152, 'us')).toBeCloseTo(66.6667, 4);
  });

  it('convertBetweenSystems round-trips a hop amount', () => {
    const ounces = convertBetweenSystems('hop-mass', 40, 'metric', 'us');

    expect(convertBetweenSystems('hop-mass', ounces, 'us', 'metric')).toBeCloseTo(40, 12);
  });

  it('unitLabel names the symbol of each system', () => {
    expect(unitLabel('grain-mass', 'us')).toBe('lb');
    expect(unitLabel('temperature', 'metric')).toBe('°C');
  });
});

describe('shownAmountText', () => {
  it('writes 4.5 kg as "4.5 kg" for metric and "9.92 lb" for US units', () => {
    expect(shownAmountText('grain-mass', 4.5, 'metric')).toBe('4.5 kg');
    expect(shownAmountText('grain-mass', 4.5, 'us')).toBe('9.92 lb');
  });
});
