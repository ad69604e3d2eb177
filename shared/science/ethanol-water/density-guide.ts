import { evaluateOimlPolynomial } from './oiml-density';

// Newton's start for the density inverse. The curve p(share), share being how far a density lies
// from water's towards ethanol's at the same t, changes slowly with temperature: sampled at 65
// shares and five temperatures and interpolated, it starts within ~1e-4, so two steps finish.
const NODES = 64;
const TEMPERATURES = [0, 10, 20, 30, 40];
let tables: Float64Array[] | undefined;

function bisect(target: number, tau: number): number {
  let lo = 0;
  let hi = 1;
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (evaluateOimlPolynomial(mid, tau) > target) lo = mid; else hi = mid;
  }
  return 0.5 * (lo + hi);
}

function buildTables(): Float64Array[] {
  return TEMPERATURES.map((t) => {
    const tau = t - 20;
    const water = evaluateOimlPolynomial(0, tau);
    const ethanol = evaluateOimlPolynomial(1, tau);
    const table = new Float64Array(NODES + 1);
    for (let j = 0; j <= NODES; j++) table[j] = j === 0 ? 0 : j === NODES ? 1 : bisect(water + (ethanol - water) * (j / NODES), tau);
    return table;
  });
}

function lookup(table: Float64Array, position: number, j: number): number {
  return table[j] + (table[j + 1] - table[j]) * (position - j);
}

/** Starting mass fraction for a density a share (0–1) of the way from water's to ethanol's at t (0–40 °C). */
export function guessMassFraction(share: number, temperature: number): number {
  tables ??= buildTables();
  const position = Math.min(Math.max(share, 0), 1) * NODES;
  const j = Math.min(Math.floor(position), NODES - 1);
  const slot = Math.min(Math.max(temperature / 10, 0), TEMPERATURES.length - 1.000001);
  const i = Math.floor(slot);
  const low = lookup(tables[i], position, j);
  return low + (lookup(tables[i + 1], position, j) - low) * (slot - i);
}
