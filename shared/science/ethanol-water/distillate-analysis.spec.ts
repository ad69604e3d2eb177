import { analyseDistillate } from './distillate-analysis';

describe('analyseDistillate', () => {
  // CRC Handbook, ethanol 10 % by mass at 20 °C is 981.87 kg/m³ (from memory), and by the definition
  // of % vol, 0.10 × 981.87 / 789.24 (OIML pure ethanol at 20 °C) = 12.44 % vol.
  it('gives about 12.44 % vol for a distillate of 981.87 kg/m³ made up to the sample volume', () => {
    expect(Math.abs(analyseDistillate(0.1, 0.1, 981.87, 20).beerPercentVolume20 - 12.44)).toBeLessThan(0.05);
  });

  it('halves the beer % vol when the sample was half the made-up volume', () => {
    const full = analyseDistillate(0.1, 0.1, 990, 20);
    const half = analyseDistillate(0.1, 0.05, 990, 20);
    expect(half.beerPercentVolume20).toBeCloseTo(full.beerPercentVolume20 / 2, 12);
  });

  it('flags a result above the strength of any beer', () => {
    expect(analyseDistillate(0.1, 0.1, 948, 20).aboveBeerRange).toBe(true);
    expect(analyseDistillate(0.1, 0.1, 992, 20).aboveBeerRange).toBe(false);
  });

  it('gives 0 % vol for a distillate with the density of water', () => {
    expect(analyseDistillate(0.1, 0.1, 998.2012, 20).beerPercentVolume20).toBeLessThan(0.001);
  });
});
