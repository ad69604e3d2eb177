import { platoFromSg, sgFromPlato } from '../science';
import { forecastFermentation, FermentationForecast } from './fermentation-forecast';
import { logisticExtract } from './logistic-extract-model';

const DAY = 86_400_000;
const START = Date.UTC(2026, 10, 1, 8);
// A typical ale: 12 °P wort down to 2.4 °P (SG 1.048 → 1.0094), steepest fall on day 2.5 at
// 1.6 per day; Speers et al. (2003) report industrial fits of this shape (figures invented for the test).
const TRUE = [12, 2.4, 1.6, 2.5];

/** Deterministic pseudo-random normal numbers (mulberry32 + Box–Muller), so each run sees the same noise. */
function normalNoise(seed: number): () => number {
  let a = seed >>> 0;
  const uniform = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
}

function readings(days: number[], sgNoise = 0, seed = 1) {
  const noise = normalNoise(seed);
  return days.map((d) => ({ time: START + d * DAY, gravity: sgFromPlato(logisticExtract(d, TRUE)) + sgNoise * noise() }));
}

const everyHalfDay = (upTo: number) => Array.from({ length: Math.floor(upTo * 2) + 1 }, (_, i) => i / 2);

function forecast(...args: Parameters<typeof forecastFermentation>): FermentationForecast {
  const result = forecastFermentation(...args);
  if (result.status !== 'forecast') throw new Error(`expected a forecast, got ${result.status}`);
  return result;
}

describe('forecastFermentation', () => {
  it('recovers the four parameters of an exact synthetic logistic curve', () => {
    const result = forecast(readings(everyHalfDay(8)));

    expect(result.parameters.initialExtract).toBeCloseTo(12, 4);
    expect(result.parameters.finalExtract).toBeCloseTo(2.4, 4);
    expect(result.parameters.rate).toBeCloseTo(1.6, 4);
    expect(result.parameters.midpointDay).toBeCloseTo(2.5, 4);
    expect(result.finalGravity).toBeCloseTo(sgFromPlato(2.4), 6);
  });

  it('puts the finish day where the curve comes within 0.25 °P of its end', () => {
    const result = forecast(readings(everyHalfDay(8)));
    // By hand: (12 − 2.4)/0.25 − 1 = 37.4; ln 37.4 / 1.6 = 2.264 days after day 2.5 → day 4.764.
    expect((result.finishTime - START) / DAY).toBeCloseTo(4.764, 2);
  });

  it('keeps the true final gravity inside its band on readings with hydrometer-sized noise', () => {
    const result = forecast(readings(everyHalfDay(6), 0.0005, 7));
    const trueFg = sgFromPlato(2.4);

    expect(result.finalGravityLow).toBeLessThanOrEqual(trueFg);
    expect(result.finalGravityHigh).toBeGreaterThanOrEqual(trueFg);
    expect(result.finalGravityHigh - result.finalGravityLow).toBeLessThan(0.004);
  });

  it('covers the true final gravity in at least 85 of 100 noisy runs (a 95 % band)', () => {
    const trueFg = sgFromPlato(2.4);
    let covered = 0;
    for (let seed = 1; seed <= 100; seed++) {
      const result = forecastFermentation(readings(everyHalfDay(6), 0.0005, seed));
      if (result.status === 'forecast' && result.finalGravityLow <= trueFg && trueFg <= result.finalGravityHigh) covered++;
    }
    expect(covered).toBeGreaterThanOrEqual(85);
  });

  it('narrows its band as readings arrive', () => {
    const all = readings(everyHalfDay(8), 0.0005, 3);
    const early = forecast(all.slice(0, 8));
    const later = forecast(all);

    expect(later.finalGravityHigh - later.finalGravityLow).toBeLessThan(early.finalGravityHigh - early.finalGravityLow);
  });

  it('asks for more readings when there are fewer than six', () => {
    const result = forecastFermentation(readings([0, 1, 2, 3, 4]));
    expect(result.status).toBe('not-enough-readings');
  });

  it('gives no forecast while the gravity has not started to fall', () => {
    const flat = [0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6].map((d) => ({ time: START + d * DAY, gravity: 1.048 }));
    expect(forecastFermentation(flat).status).toBe('no-fall-yet');
  });

  it('draws a curve whose band holds its own line', () => {
    const result = forecast(readings(everyHalfDay(6), 0.0005, 5));
    for (const point of result.curve) {
      expect(point.low).toBeLessThanOrEqual(point.gravity);
      expect(point.high).toBeGreaterThanOrEqual(point.gravity);
    }
    expect(platoFromSg(result.curve[0].gravity)).toBeGreaterThan(10);
  });
});

describe('forecastFermentation on a logger\'s log', () => {
  it('fits ten thousand noisy readings through binned means and still holds the true final gravity in its band', () => {
    const days = Array.from({ length: 10_000 }, (_, i) => (8 * i) / 10_000);
    const result = forecast(readings(days, 0.002, 11));
    const trueFg = sgFromPlato(2.4);

    expect(result.readingsUsed).toBe(10_000);
    expect(result.finalGravityLow).toBeLessThanOrEqual(trueFg);
    expect(result.finalGravityHigh).toBeGreaterThanOrEqual(trueFg);
    expect(result.parameters.midpointDay).toBeCloseTo(2.5, 1);
  });
});
