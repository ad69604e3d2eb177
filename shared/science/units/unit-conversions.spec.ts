import fc from 'fast-check';
import {
  celsiusToFahrenheit, fahrenheitToCelsius, gramsToOunces, kilogramsToPounds, litresToUsGallons,
  ouncesToGrams, poundsToKilograms, usGallonsToLitres,
} from './unit-conversions';
import { ScienceRangeError } from './science-range-error';

describe('unit conversions', () => {
  // NIST SP 811 (2008), Appendix B: exact definitions of the gallon, pound and ounce.
  it('converts 1 US gallon to 3.785411784 L (NIST SP 811)', () => {
    expect(usGallonsToLitres(1)).toBeCloseTo(3.785411784, 12);
  });

  it('converts 1 lb to 0.45359237 kg (NIST SP 811)', () => {
    expect(poundsToKilograms(1)).toBeCloseTo(0.45359237, 12);
  });

  it('converts 1 oz to 28.349523125 g (NIST SP 811)', () => {
    expect(ouncesToGrams(1)).toBeCloseTo(28.349523125, 9);
  });

  it('maps the fixed points of water, 0 °C → 32 °F and 100 °C → 212 °F', () => {
    expect(celsiusToFahrenheit(0)).toBeCloseTo(32, 12);
    expect(celsiusToFahrenheit(100)).toBeCloseTo(212, 12);
  });

  it('round-trips every conversion within 1e-12 relative', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1e6, noNaN: true }), (v) => {
      const close = (a: number) => Math.abs(a - v) <= 1e-12 * Math.max(1, v);
      return close(litresToUsGallons(usGallonsToLitres(v))) && close(poundsToKilograms(kilogramsToPounds(v)))
        && close(ouncesToGrams(gramsToOunces(v))) && close(fahrenheitToCelsius(celsiusToFahrenheit(v)));
    }));
  });

  it('throws a ScienceRangeError for a negative volume and below absolute zero', () => {
    expect(() => litresToUsGallons(-1)).toThrow(ScienceRangeError);
    expect(() => celsiusToFahrenheit(-300)).toThrow(ScienceRangeError);
  });
});
