// Throughput of the science core, each figure also as a ratio to the bare OIML density polynomial
// measured in the same run, so results compare across machines.
import { ethanolWaterDensity, massFractionFromDensity, strengthBreakdown } from '@shared/science';
import { evaluateOimlPolynomial } from '@shared/science/ethanol-water/oiml-density';
import { runApiBench } from './bench/api-bench';
import { benchChartRender } from './bench/chart-render-bench';
import { join } from 'node:path';
import { benchReadingsApi } from './bench/readings-api-bench';
import { benchBookingsApi } from './bench/bookings-api-bench';
import { benchBrewPlan } from './bench/brew-plan-bench';
const SAMPLES = 4096;
// Short rounds, cases interleaved, best round kept: the machine is shared, and the best round is
// the one least disturbed by other work.
const ROUND_MS = 150;
const ROUNDS = 7;

interface Case { name: string; run: (i: number) => number }

function makeInputs() {
  const p = new Float64Array(SAMPLES);
  const t = new Float64Array(SAMPLES);
  const rho = new Float64Array(SAMPLES);
  const og = new Float64Array(SAMPLES);
  const fg = new Float64Array(SAMPLES);
  for (let i = 0; i < SAMPLES; i++) {
    p[i] = (i * 0.618034) % 1;
    t[i] = (i * 7.3) % 40;
    rho[i] = ethanolWaterDensity(p[i], t[i]);
    og[i] = 1.03 + ((i * 0.37) % 1) * 0.07;
    fg[i] = 1 + (og[i] - 1) * (0.2 + ((i * 0.53) % 1) * 0.1);
  }
  return { p, t, rho, og, fg };
}

function measure(c: Case): number {
  let sink = 0;
  let count = 0;
  const start = process.hrtime.bigint();
  const deadline = start + BigInt(ROUND_MS) * 1_000_000n;
  let now = start;
  while (now < deadline) {
    for (let i = 0; i < 1024; i++) sink += c.run((count + i) & (SAMPLES - 1));
    count += 1024;
    now = process.hrtime.bigint();
  }
  if (sink === 42.4242) process.stdout.write('');
  return count / (Number(now - start) / 1e9);
}

function main(): void {
  const x = makeInputs();
  const cases: Case[] = [
    { name: 'density polynomial (baseline)', run: (i) => evaluateOimlPolynomial(x.p[i], x.t[i] - 20) },
    { name: 'density (checked)', run: (i) => ethanolWaterDensity(x.p[i], x.t[i]) },
    { name: 'inversion density → mass fraction', run: (i) => massFractionFromDensity(x.rho[i], x.t[i]) },
    { name: 'batch strength breakdown', run: (i) => strengthBreakdown(x.og[i], x.fg[i]).percentVolume20 },
  ];
  for (const c of cases) for (let i = 0; i < 50000; i++) c.run(i & (SAMPLES - 1));
  const rates = cases.map(() => 0);
  for (let round = 0; round < ROUNDS; round++) cases.forEach((c, i) => { rates[i] = Math.max(rates[i], measure(c)); });
  const baseline = rates[0];
  process.stdout.write(`Science core throughput (one core, best of ${ROUNDS} rounds of ${ROUND_MS} ms per case)\n`);
  cases.forEach((c, i) => {
    const cost = baseline / rates[i];
    process.stdout.write(`${c.name.padEnd(36)} ${Math.round(rates[i]).toLocaleString('en').padStart(14)} /s   cost ${cost.toFixed(2).padStart(6)} × bare density\n`);
  });
  const inversionCost = baseline / rates[2];
  process.stdout.write(`targets: inversion ≤ 5 density evaluations: ${inversionCost <= 5 ? 'met' : 'NOT met'} (${inversionCost.toFixed(2)}); ` +
    `breakdown ≫ 100,000/s: ${rates[3] > 100000 ? 'met' : 'NOT met'} (${Math.round(rates[3]).toLocaleString('en')}/s)\n`);
}

main();
// The API parts need their own MariaDB; `npm run bench -- --science` skips them. The chart part needs only Chromium.
const root = join(__dirname, '..');
const apiBench = process.argv.includes('--science')
  ? Promise.resolve()
  : runApiBench().then(() => benchReadingsApi(root)).then(() => benchBookingsApi(root)).then(() => benchBrewPlan(root));
apiBench.then(benchChartRender).then(
  () => process.exit(0),
  (error) => {
    console.error(error);
    process.exit(1);
  },
);
