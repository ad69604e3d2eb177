import { platoFromSg, sgFromPlato, PLATO_MAX, PLATO_MIN } from '../science';
import { CurveFit, levenbergMarquardt } from './levenberg-marquardt';
import { dayWithinMargin, fromVector, logisticExtract, logisticGradient, LogisticParameters } from './logistic-extract-model';
import { binReadings } from './reading-bins';
import { studentT975 } from './student-t';

/** One gravity reading: when (ms since the epoch) and the corrected SG 20/20 °C. */
export interface GravityPoint { time: number; gravity: number }

/** A point of the forecast curve with its 95 % band, for drawing. */
export interface ForecastCurvePoint { time: number; gravity: number; low: number; high: number }

/** Final gravity and the day it is reached, each with a 95 % band that narrows as readings arrive. */
export interface FermentationForecast {
  status: 'forecast';
  parameters: LogisticParameters;
  /** Time of the first reading; the model's days count from here. */
  originTime: number;
  finalGravity: number;
  finalGravityLow: number;
  finalGravityHigh: number;
  finishTime: number;
  finishTimeEarly: number;
  finishTimeLate: number;
  readingsUsed: number;
  curve: ForecastCurvePoint[];
}

/** Why there is no forecast yet. */
export interface NoForecast { status: 'not-enough-readings' | 'no-fall-yet'; message: string; readingsUsed: number }

export interface ForecastOptions {
  /** The curve counts as finished once within this many °P of its end (default 0.25 °P ≈ 0.001 SG). */
  finishMarginPlato?: number;
  /** Points of the drawn curve (default 60). */
  curvePoints?: number;
}

/** Fewest readings for a forecast: four parameters and at least two degrees of freedom. */
export const MIN_FORECAST_READINGS = 6;
const DAY_MS = 86_400_000;
/** A logger's thousands of rows are averaged into this many stretches of time before fitting. */
const MAX_FITTED_POINTS = 300;

const model = { value: logisticExtract, gradient: logisticGradient };

function startingGuesses(days: number[], extracts: number[]): number[][] {
  const high = Math.max(...extracts);
  const low = Math.min(...extracts);
  const half = (high + low) / 2;
  const crossing = days[extracts.findIndex((e) => e <= half)] ?? days[days.length - 1];
  return [0.5, 1, 2, 4].map((rate) => [high, low - 0.05 * (high - low), rate, crossing]);
}

function bestFit(days: number[], extracts: number[]): CurveFit {
  return startingGuesses(days, extracts)
    .map((guess) => levenbergMarquardt(model, days, extracts, guess))
    .filter((fit) => fit.params.every(Number.isFinite))
    .reduce((best, fit) => (fit.sumOfSquares < best.sumOfSquares ? fit : best));
}

/** Variance of a function of the parameters by the delta method, gradient by central differences. */
function deltaVariance(f: (v: number[]) => number, params: number[], covariance: number[][]): number {
  const grad = params.map((p, i) => {
    const h = Math.max(Math.abs(p) * 1e-6, 1e-8);
    const up = params.slice();
    const down = params.slice();
    up[i] += h;
    down[i] -= h;
    return (f(up) - f(down)) / (2 * h);
  });
  let variance = 0;
  for (let a = 0; a < grad.length; a++) for (let b = 0; b < grad.length; b++) variance += grad[a] * covariance[a][b] * grad[b];
  return Math.max(variance, 0);
}

const toSg = (plato: number) => sgFromPlato(Math.max(PLATO_MIN, Math.min(PLATO_MAX, plato)));

/** Fits the logistic model to the readings and forecasts the final gravity and the day it is reached. */
export function forecastFermentation(readings: readonly GravityPoint[], options: ForecastOptions = {}): FermentationForecast | NoForecast {
  const sorted = [...readings].sort((a, b) => a.time - b.time);
  const used = sorted.length;
  if (used < MIN_FORECAST_READINGS) {
    return { status: 'not-enough-readings', message: `A forecast needs at least ${MIN_FORECAST_READINGS} readings; there are ${used}.`, readingsUsed: used };
  }
  const origin = sorted[0].time;
  const fitted = binReadings(sorted, MAX_FITTED_POINTS);
  const days = fitted.map((r) => (r.time - origin) / DAY_MS);
  const extracts = fitted.map((r) => platoFromSg(r.gravity));
  const fit = bestFit(days, extracts);
  const [pi, pe, rate] = fit.params;
  if (!(rate > 0) || !(pi - pe > 0.5) || !fit.covariance || !fit.covariance.flat().every(Number.isFinite)) {
    return { status: 'no-fall-yet', message: 'The readings do not yet show the fall of a fermentation; add more as it goes on.', readingsUsed: used };
  }
  const t = studentT975(fitted.length - 4);
  const margin = options.finishMarginPlato ?? 0.25;
  const finishDay = (v: number[]) => Math.max(dayWithinMargin(v, margin), 0);
  const feHalf = t * Math.sqrt(Math.max(fit.covariance[1][1], 0));
  const finish = finishDay(fit.params);
  const finishHalf = t * Math.sqrt(deltaVariance(finishDay, fit.params, fit.covariance));
  const lastDay = Math.max(days[days.length - 1], finish + finishHalf) * 1.1 + 0.5;
  const steps = options.curvePoints ?? 60;
  const curve = Array.from({ length: steps + 1 }, (_, i): ForecastCurvePoint => {
    const day = (lastDay * i) / steps;
    const value = logisticExtract(day, fit.params);
    const half = t * Math.sqrt(deltaVariance((v) => logisticExtract(day, v), fit.params, fit.covariance!));
    return { time: origin + day * DAY_MS, gravity: toSg(value), low: toSg(value - half), high: toSg(value + half) };
  });
  return {
    status: 'forecast',
    parameters: fromVector(fit.params),
    originTime: origin,
    finalGravity: toSg(pe),
    finalGravityLow: toSg(pe - feHalf),
    finalGravityHigh: toSg(pe + feHalf),
    finishTime: origin + finish * DAY_MS,
    finishTimeEarly: origin + Math.max(finish - finishHalf, 0) * DAY_MS,
    finishTimeLate: origin + (finish + finishHalf) * DAY_MS,
    readingsUsed: used,
    curve,
  };
}
