import { strikeWaterTemperature } from './strike-temperature';
import { celsiusToFahrenheit, fahrenheitToCelsius } from '../units/unit-conversions';

describe('strikeWaterTemperature', () => {
  // Palmer, How to Brew, infusion equation (0.2/r)(T2 − T1) + T2 with r in qt/lb, from memory; hand-worked
  // for r = 1.5 qt/lb, grain 70 °F, target 154 °F: 165.2 °F. 0.2 is 0.4 rounded after the qt/lb units.
  it('agrees with the US-units worked example within 1 °F', () => {
    const ratio = (1.5 * 0.946352946) / 0.45359237;
    const strike = strikeWaterTemperature(fahrenheitToCelsius(154), fahrenheitToCelsius(70), ratio);
    expect(Math.abs(celsiusToFahrenheit(strike) - 165.2)).toBeLessThan(1);
  });

  it('equals the target when grain is already at mash temperature', () => {
    expect(strikeWaterTemperature(45, 45, 3)).toBe(45);
  });
});

describe('strikeWaterTemperature with a mash tun', () => {
  // Hand-worked heat balance (common practice: c_grain 0.4 c_water, c_water 4.18 kJ/(kg·K)):
  // 5 kg grain at 20 °C, 15 L water (3 L/kg), target 66 °C, tun 4.18 kJ/K.
  // (15 × 4.18)(Ts − 66) = (5 × 0.4 × 4.18 + 4.18)(66 − 20) → Ts = 66 + 3 × 46 / 15 = 75.2 °C.
  it('adds the heat the tun takes, per the hand-worked balance', () => {
    const strike = strikeWaterTemperature(66, 20, 3, 0.4, { heatCapacityKjPerK: 4.18, grainKilograms: 5 });
    expect(strike).toBeCloseTo(75.2, 6);
  });

  it('equals the plain formula for a tun of no heat capacity', () => {
    expect(strikeWaterTemperature(66, 20, 3, 0.4, { heatCapacityKjPerK: 0, grainKilograms: 5 })).toBeCloseTo(strikeWaterTemperature(66, 20, 3), 12);
  });

  it('asks for hotter water the heavier the tun', () => {
    const light = strikeWaterTemperature(66, 20, 3, 0.4, { heatCapacityKjPerK: 2, grainKilograms: 5 });
    const heavy = strikeWaterTemperature(66, 20, 3, 0.4, { heatCapacityKjPerK: 8, grainKilograms: 5 });
    expect(heavy).toBeGreaterThan(light);
  });
});
