import type { ChartData, ChartOptions } from 'chart.js';
import type { ChartReading, FermentationForecast } from '@shared/fermentation';

const SPRUCE = '#2F5D50';
const COPPER = '#B86B3C';
const BAND = 'rgba(47, 93, 80, 0.15)';

type Point = { x: number; y: number };

/** Gravity and temperature over time, with the forecast curve and its 95 % band, as Chart.js datasets. */
export function gravityChartData(readings: readonly ChartReading[], forecast: FermentationForecast | null): ChartData<'line', Point[]> {
  const gravity = readings.map((r) => ({ x: r.at, y: r.sg }));
  const temperature = readings.filter((r) => r.temperatureC !== null).map((r) => ({ x: r.at, y: r.temperatureC! }));
  const datasets: ChartData<'line', Point[]>['datasets'] = [
    { label: 'Gravity (SG)', data: gravity, yAxisID: 'sg', borderColor: SPRUCE, backgroundColor: SPRUCE, pointRadius: 2, borderWidth: 1.5 },
    { label: 'Temperature (°C)', data: temperature, yAxisID: 'temperature', borderColor: COPPER, backgroundColor: COPPER, pointRadius: 0, borderWidth: 1 },
  ];
  if (forecast) {
    const curve = forecast.curve;
    datasets.push(
      { label: 'Forecast, 95 % band (low)', data: curve.map((p) => ({ x: p.time, y: p.low })), yAxisID: 'sg', borderWidth: 0, pointRadius: 0, backgroundColor: BAND, fill: false },
      { label: 'Forecast, 95 % band', data: curve.map((p) => ({ x: p.time, y: p.high })), yAxisID: 'sg', borderWidth: 0, pointRadius: 0, backgroundColor: BAND, fill: '-1' },
      { label: 'Forecast', data: curve.map((p) => ({ x: p.time, y: p.gravity })), yAxisID: 'sg', borderColor: SPRUCE, borderDash: [6, 4], borderWidth: 1.5, pointRadius: 0 },
    );
  }
  return { datasets };
}

/** Time axis in the co-op's zone, two value axes, and LTTB decimation so ten thousand readings draw as a few hundred. */
export function gravityChartOptions(timeZone: string): ChartOptions<'line'> {
  return {
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    parsing: false,
    normalized: true,
    spanGaps: true,
    interaction: { mode: 'nearest', axis: 'x', intersect: false },
    plugins: {
      decimation: { enabled: true, algorithm: 'lttb', samples: 400, threshold: 800 },
      legend: { labels: { filter: (item) => !item.text.endsWith('(low)') } },
    },
    scales: {
      x: { type: 'time', adapters: { date: { zone: timeZone } }, time: { tooltipFormat: 'd LLL HH:mm' }, title: { display: true, text: 'Time' } },
      sg: { type: 'linear', position: 'left', title: { display: true, text: 'SG 20/20 °C' } },
      temperature: { type: 'linear', position: 'right', grid: { drawOnChartArea: false }, title: { display: true, text: '°C' } },
    },
  };
}
