import { PITCH_RATES, yeastCellsToPitch } from './yeast-pitch';

describe('yeastCellsToPitch', () => {
  // Common practice: 0.75 million cells/mL/°P for ales; hand-worked 0.75 × 20 000 mL × 12 °P = 180 billion.
  it('gives 180 billion cells for 20 L of 12 °P ale wort', () => {
    expect(yeastCellsToPitch(20, 12, PITCH_RATES.ale)).toBeCloseTo(180, 9);
  });

  it('doubles for a lager at the common 1.5 rate', () => {
    expect(yeastCellsToPitch(20, 12, PITCH_RATES.lager)).toBeCloseTo(360, 9);
  });
});
