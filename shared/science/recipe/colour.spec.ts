import { moreyColour, moreyColourMetric } from './colour';

describe('Morey colour', () => {
  // Morey's equation, hand-worked: 10 lb of 3 °L malt in 5 gal → MCU 6; SRM = 1.4922 × 6^0.6859 = 5.100; EBC = 1.97 × SRM.
  it('gives MCU 6, SRM 5.10, EBC 10.05 for 10 lb of 3 °L in 5 gal', () => {
    const colour = moreyColour([{ pounds: 10, lovibond: 3 }], 5);
    expect(colour.mcu).toBeCloseTo(6, 12);
    expect(colour.srm).toBeCloseTo(5.1, 2);
    expect(colour.ebc).toBeCloseTo(10.05, 1);
  });

  it('gives the same colour for the same bill in metric units', () => {
    const metric = moreyColourMetric([{ kilograms: 4.5359237, lovibond: 3 }], 18.92705892);
    expect(metric.srm).toBeCloseTo(moreyColour([{ pounds: 10, lovibond: 3 }], 5).srm, 9);
  });

  it('throws for a malt with no mass', () => {
    expect(() => moreyColour([{ lovibond: 3 }], 5)).toThrow(/malts\[0\].pounds = NaN/);
  });
});
