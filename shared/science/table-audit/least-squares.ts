/**
 * Linear least squares min ||A·c − b|| by Householder QR (A is m×n, row-major, m ≥ n).
 * QR rather than normal equations: a Redlich–Kister design of order 15+ is ill-conditioned
 * enough that squaring its condition number would cost most of the digits.
 */
export interface LeastSquaresSolution {
  coefficients: number[];
  /** The n×n upper-triangular factor R of A = QR, for leverages. */
  r: number[][];
}

/** Solves the least-squares problem; see the note above on why QR. */
export function solveLeastSquares(a: number[][], b: number[]): LeastSquaresSolution {
  const m = a.length;
  const n = a[0]?.length ?? 0;
  const r = a.map((row) => row.slice());
  const y = b.slice();
  for (let k = 0; k < n; k++) {
    let norm = 0;
    for (let i = k; i < m; i++) norm += r[i][k] * r[i][k];
    norm = Math.sqrt(norm);
    if (norm === 0) continue;
    const alpha = r[k][k] > 0 ? -norm : norm;
    const v = new Float64Array(m - k);
    for (let i = k; i < m; i++) v[i - k] = r[i][k];
    v[0] -= alpha;
    let vv = 0;
    for (let i = 0; i < v.length; i++) vv += v[i] * v[i];
    if (vv === 0) continue;
    for (let j = k; j < n; j++) reflect(r, v, k, j, vv);
    let dot = 0;
    for (let i = k; i < m; i++) dot += v[i - k] * y[i];
    const f = (2 * dot) / vv;
    for (let i = k; i < m; i++) y[i] -= f * v[i - k];
  }
  return { coefficients: backSubstitute(r, y, n), r: r.slice(0, n) };
}

/** Leverage of a design row, h = rowᵀ(AᵀA)⁻¹row = |R⁻ᵀ·row|², by forward substitution. */
export function leverage(r: readonly number[][], row: readonly number[]): number {
  const n = row.length;
  const z = new Float64Array(n);
  let sum = 0;
  for (let k = 0; k < n; k++) {
    let s = row[k];
    for (let j = 0; j < k; j++) s -= r[j][k] * z[j];
    z[k] = r[k][k] === 0 ? 0 : s / r[k][k];
    sum += z[k] * z[k];
  }
  return sum;
}

function reflect(r: number[][], v: Float64Array, k: number, j: number, vv: number): void {
  let dot = 0;
  for (let i = k; i < r.length; i++) dot += v[i - k] * r[i][j];
  const f = (2 * dot) / vv;
  for (let i = k; i < r.length; i++) r[i][j] -= f * v[i - k];
}

function backSubstitute(r: number[][], y: number[], n: number): number[] {
  const c = new Array<number>(n).fill(0);
  for (let k = n - 1; k >= 0; k--) {
    let s = y[k];
    for (let j = k + 1; j < n; j++) s -= r[k][j] * c[j];
    c[k] = r[k][k] === 0 ? 0 : s / r[k][k];
  }
  return c;
}
