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
