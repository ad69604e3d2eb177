import { requireInRange, requireNotAbove, requirePositive } from './range-guard';
import { ScienceRangeError } from './science-range-error';

describe('requireInRange', () => {
  it('returns a value inside the range unchanged', () => {
    expect(requireInRange('t', 20, 0, 40, '°C')).toBe(20);
  });

  it('throws a ScienceRangeError naming the value and the range when NaN', () => {
    const act = () => requireInRange('t', Number.NaN, 0, 40, '°C');
    expect(act).toThrow(ScienceRangeError);
    expect(act).toThrow(/t = NaN °C .* 0 to 40 °C/);
  });

  it('records parameter, value, range and reason on the error when above range', () => {
    try {
      requireInRange('plato', 41, 0, 40, '°P');
      throw new Error('expected a throw');
    } catch (error) {
      expect(error).toMatchObject({ parameter: 'plato', value: 41, min: 0, max: 40, reason: 'above-range' });
    }
  });
});

describe('requirePositive', () => {
  it('throws when zero', () => {
    expect(() => requirePositive('volume', 0, 'L')).toThrow(/volume = 0 L must be above 0/);
  });
});

describe('requireNotAbove', () => {
  it('throws an inconsistent error when FG is above OG', () => {
    expect(() => requireNotAbove('fg', 1.06, 'og', 1.05, 'SG')).toThrow(/fg = 1.06 SG must not be above og = 1.05 SG/);
  });
});
