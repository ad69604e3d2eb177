import { fermentationFlags, GravityPoint, isGravityStable } from './fermentation-flags';
import { fermentationProgress } from './fermentation-progress';

const HOUR = 3600_000;
const series = (values: number[], stepHours: number, instrument: GravityPoint['instrument'] = 'hydrometer'): GravityPoint[] =>
  values.map((sg, i) => ({ at: i * stepHours * HOUR, sg, instrument }));

describe('fermentation flags', () => {
  // Common practice: fermentation is over when gravity holds within the instrument's resolution for two days.
  it('when a hydrometer reads 1.012 for 48 h, then gravity is stable', () => {
    expect(isGravityStable(series([1.03, 1.012, 1.012, 1.012], 24))).toBe(true);
  });

  it('when the steady span is shorter than 48 h, then it is not yet stable', () => {
    expect(isGravityStable(series([1.03, 1.02, 1.012, 1.012], 24))).toBe(false);
  });

  it('when gravity still falls by more than one graduation, then it is not stable', () => {
    expect(isGravityStable(series([1.016, 1.014, 1.012], 24))).toBe(false);
  });

  it('when a density meter moves 0.0005 in two days, then it is not stable (its resolution is 0.0001)', () => {
    expect(isGravityStable(series([1.0125, 1.0122, 1.012], 24, 'density-meter'))).toBe(false);
  });

  it('when stable near the expected attenuation, then it is finished and not stuck', () => {
    expect(fermentationFlags(series([1.012, 1.012, 1.012], 24), 76, 75)).toEqual({ finished: true, stuck: false });
  });

  it('when stable far above the expected attenuation, then it is stuck and not finished', () => {
    expect(fermentationFlags(series([1.03, 1.03, 1.03], 24), 40, 75)).toEqual({ finished: false, stuck: true });
  });

  it('when summarising a log, then attenuation and ABV so far follow from the OG and the latest reading', () => {
    const progress = fermentationProgress(series([1.05, 1.03, 1.02], 24), 1.05, 75);
    // ABV by the linear rule (1.050 − 1.020) × 131.25 = 3.94 % (common practice).
    expect(progress.abvSoFar).toBeCloseTo(3.9375, 4);
    expect(progress.apparentAttenuationPercent).toBeGreaterThan(58);
    expect(progress.apparentAttenuationPercent).toBeLessThan(61);
    expect(progress).toMatchObject({ latestSg: 1.02, readingCount: 3, finished: false, stuck: false });
  });
});
