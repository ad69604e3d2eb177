import { alcoholByMass, realExtract } from './balling';

describe("Balling's relations", () => {
  // Balling's relations as given in brewing texts (e.g. De Clerck, A Textbook of Brewing, 1957),
  // from memory; hand-worked for OE 12.0 °P, AE 2.5 °P:
  // RE = 0.1808·12 + 0.8192·2.5 = 4.2176 °P; ABW = (12 − 4.2176)/(2.0665 − 0.010665·12) = 4.0146 % m/m.
  it('gives RE 4.2176 °P for OE 12.0 and AE 2.5', () => {
    expect(realExtract(12, 2.5)).toBeCloseTo(4.2176, 4);
  });

  it('gives ABW 4.0146 % m/m for OE 12.0 and RE 4.2176', () => {
    expect(alcoholByMass(12, 4.2176)).toBeCloseTo(4.0146, 4);
  });

  it('gives no alcohol when nothing fermented', () => {
    expect(alcoholByMass(12, realExtract(12, 12))).toBeCloseTo(0, 12);
  });

  it('throws when the apparent extract is above the original', () => {
    expect(() => realExtract(10, 12)).toThrow(/apparentExtract = 12 °P must not be above originalExtract = 10 °P/);
  });
});
