/**
 * A small Levenberg–Marquardt least-squares fit (Marquardt 1963, with the diagonal scaling of
 * JᵀJ) for models of a handful of parameters, and the covariance of the estimate.
 */
export interface CurveModel {
  value(x: number, params: readonly number[]): number;
  gradient(x: number, params: readonly number[]): number[];
}

export interface CurveFit {
  params: number[];
  sumOfSquares: number;
  /** s²·(JᵀJ)⁻¹ with s² = SSR/(n − p); null when n ≤ p or JᵀJ is singular. */
  covariance: number[][] | null;
  iterations: number;
}

const MAX_ITERATIONS = 300;

function sumOfSquares(model: CurveModel, xs: readonly number[], ys: readonly number[], params: readonly number[]): number {
  let s = 0;
  for (let i = 0; i < xs.length; i++) s += (ys[i] - model.value(xs[i], params)) ** 2;
  return s;
}

function normalEquations(model: CurveModel, xs: readonly number[], ys: readonly number[], params: readonly number[]) {
  const p = params.length;
  const jtj = Array.from({ length: p }, () => new Array<number>(p).fill(0));
  const jtr = new Array<number>(p).fill(0);
  for (let i = 0; i < xs.length; i++) {
    const g = model.gradient(xs[i], params);
    const r = ys[i] - model.value(xs[i], params);
    for (let a = 0; a < p; a++) {
      jtr[a] += g[a] * r;
      for (let b = 0; b < p; b++) jtj[a][b] += g[a] * g[b];
    }
  }
  return { jtj, jtr };
}

/** Solves A·x = b by Gaussian elimination with partial pivoting; null when A is singular. */
export function solveLinear(a: readonly number[][], b: readonly number[]): number[] | null {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i]]);
  for (let k = 0; k < n; k++) {
    let pivot = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(m[i][k]) > Math.abs(m[pivot][k])) pivot = i;
    if (!(Math.abs(m[pivot][k]) > 1e-300)) return null;
    [m[k], m[pivot]] = [m[pivot], m[k]];
    for (let i = k + 1; i < n; i++) {
      const f = m[i][k] / m[k][k];
      for (let j = k; j <= n; j++) m[i][j] -= f * m[k][j];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let k = n - 1; k >= 0; k--) {
    let s = m[k][n];
    for (let j = k + 1; j < n; j++) s -= m[k][j] * x[j];
    x[k] = s / m[k][k];
  }
  return x.every(Number.isFinite) ? x : null;
}

function invert(a: readonly number[][]): number[][] | null {
  const columns = a.map((_, j) => solveLinear(a, a.map((__, i) => (i === j ? 1 : 0))));
  if (columns.some((c) => c === null)) return null;
  return a.map((_, i) => columns.map((c) => c![i]));
}

/** Fits the model to (x, y) from a starting guess. */
export function levenbergMarquardt(model: CurveModel, xs: readonly number[], ys: readonly number[], start: readonly number[]): CurveFit {
  let params = [...start];
  let ssr = sumOfSquares(model, xs, ys, params);
  let lambda = 1e-3;
  let iterations = 0;
  for (; iterations < MAX_ITERATIONS; iterations++) {
    const { jtj, jtr } = normalEquations(model, xs, ys, params);
    let improved = false;
    while (lambda < 1e12) {
      const damped = jtj.map((row, i) => row.map((v, j) => (i === j ? v + lambda * Math.max(v, 1e-12) : v)));
      const step = solveLinear(damped, jtr);
      const trial = step ? params.map((v, i) => v + step[i]) : null;
      const trialSsr = trial ? sumOfSquares(model, xs, ys, trial) : Infinity;
      if (trial && trialSsr <= ssr) {
        const converged = ssr - trialSsr <= 1e-14 * (ssr + 1e-30) + 1e-30;
        params = trial;
        ssr = trialSsr;
        lambda = Math.max(lambda / 10, 1e-12);
        improved = !converged;
        break;
      }
      lambda *= 10;
    }
    if (!improved) break;
  }
  const dof = xs.length - params.length;
  const inverse = dof > 0 ? invert(normalEquations(model, xs, ys, params).jtj) : null;
  const s2 = dof > 0 ? ssr / dof : 0;
  return { params, sumOfSquares: ssr, covariance: inverse && inverse.map((row) => row.map((v) => v * s2)), iterations };
}
