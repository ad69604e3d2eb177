// Render time of the fermentation chart in headless Chromium: 10,000 readings with decimation, as a
// ratio to 100 readings drawn in the same page and run, so the figure compares across machines.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { sgFromPlato } from '@shared/science';
import { gravityChartData, gravityChartOptions } from '../../src/app/fermentation/gravity-chart/gravity-chart-data';

const ROUNDS = 7;
const MODULES = join(__dirname, '..', '..', 'node_modules');
const SCRIPTS = ['chart.js/dist/chart.umd.js', 'luxon/build/global/luxon.js', 'chartjs-adapter-luxon/dist/chartjs-adapter-luxon.umd.js'];

/** A logger's log: a reading every `stepMinutes` along a logistic fall, with the temperature (figures invented for the bench). */
function loggerReadings(count: number) {
  const spanMs = 14 * 86_400_000;
  return Array.from({ length: count }, (_, i) => {
    const day = (14 * i) / count;
    return { at: Date.UTC(2026, 10, 1) + (spanMs * i) / count, sg: sgFromPlato(2.4 + 9.6 / (1 + Math.exp(1.6 * (day - 2.5)))) + 0.0005 * Math.sin(i), temperatureC: 19 + Math.sin(i / 50) };
  });
}

/** The chart's config as JSON: the legend's filter function cannot cross into the page, and costs nothing to draw. */
function config(count: number, decimation: boolean) {
  const options = gravityChartOptions('UTC');
  options.plugins = { ...options.plugins, legend: { display: true }, decimation: { ...options.plugins!.decimation!, enabled: decimation } as never };
  return JSON.stringify({ type: 'line', data: gravityChartData(loggerReadings(count), null), options });
}

export async function benchChartRender(): Promise<void> {
  const executablePath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
  if (!existsSync(executablePath)) {
    process.stdout.write(`Chart render: skipped (no Chromium at ${executablePath}; npm test installs it)\n`);
    return;
  }
  const browser = await chromium.launch({ executablePath, headless: true, args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking'] });
  try {
    const page = await browser.newPage({ viewport: { width: 1100, height: 500 } });
    await page.setContent('<div style="width:1000px;height:360px;position:relative"><canvas id="c"></canvas></div>');
    for (const script of SCRIPTS) await page.addScriptTag({ path: join(MODULES, script) });
    const cases = [
      { name: '100 readings (baseline)', json: config(100, true) },
      { name: '10,000 readings, decimated (LTTB)', json: config(10_000, true) },
      { name: '10,000 readings, not decimated', json: config(10_000, false) },
    ];
    const best = cases.map(() => Infinity);
    for (let round = 0; round < ROUNDS; round++) {
      for (const [i, c] of cases.entries()) {
        const ms = await page.evaluate((json) => {
          const w = window as unknown as { Chart: new (el: HTMLCanvasElement, cfg: unknown) => { destroy(): void } };
          const canvas = document.getElementById('c') as HTMLCanvasElement;
          const cfg = JSON.parse(json);
          const start = performance.now();
          const chart = new w.Chart(canvas, cfg);
          const elapsed = performance.now() - start;
          chart.destroy();
          return elapsed;
        }, c.json);
        best[i] = Math.min(best[i], ms);
      }
    }
    process.stdout.write(`\nFermentation chart render in headless Chromium (best of ${ROUNDS}, parse + layout + draw)\n`);
    cases.forEach((c, i) => process.stdout.write(`${c.name.padEnd(36)} ${best[i].toFixed(1).padStart(8)} ms   ${(best[i] / best[0]).toFixed(2).padStart(6)} × 100 readings\n`));
  } finally {
    await browser.close();
  }
}
