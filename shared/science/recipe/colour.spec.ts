import { ebcFromLovibond, lovibondFromEbc, moreyColour, moreyColourMetric } from './colour';

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

describe('malt colour: °L and EBC', () => {
  // SRM = 1.3546 °L − 0.76 and EBC = 1.97 SRM: the usual conversions of malt specifications
  // (common practice; the coefficients from memory). Maltsters list a 60 °L crystal malt near 150–160 EBC.
  it('puts a 60 °L crystal malt in the 150–160 EBC band of maltsters’ sheets', () => {
    expect(ebcFromLovibond(60)).toBeGreaterThan(150);
    expect(ebcFromLovibond(60)).toBeLessThan(160);
  });

  it('round-trips °L → EBC → °L across the malt range', () => {
    for (const lovibond of [1, 2, 10, 40, 120, 350, 500]) expect(lovibondFromEbc(ebcFromLovibond(lovibond))).toBeCloseTo(lovibond, 9);
  });

  it('never gives a negative colour for the palest malts', () => {
    expect(ebcFromLovibond(0)).toBe(0);
    expect(lovibondFromEbc(0)).toBeGreaterThan(0);
  });
});
