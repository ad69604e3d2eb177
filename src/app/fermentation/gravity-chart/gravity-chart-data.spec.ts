import { forecastFermentation, FermentationForecast } from '@shared/fermentation';
import { sgFromPlato } from '@shared/science';
import { gravityChartData, gravityChartOptions } from './gravity-chart-data';

const HOUR = 3_600_000;
// A logistic fall from 12 to 2.4 °P over a week, read every 6 hours at 19 °C (figures invented for the test).
const readings = Array.from({ length: 24 }, (_, i) => ({ at: i * 6 * HOUR, sg: sgFromPlato(2.4 + 9.6 / (1 + Math.exp(1.6 * (i / 4 - 2.5)))), temperatureC: 19 }));

describe('gravityChartData', () => {
  it('draws gravity and temperature, and the forecast with its band when there is one', () => {
    const forecast = forecastFermentation(readings.map((r) => ({ time: r.at, gravity: r.sg }))) as FermentationForecast;

    const data = gravityChartData(readings, forecast);

    expect(data.datasets.map((d) => d.label)).toEqual(['Gravity (SG)', 'Temperature (°C)', 'Forecast, 95 % band (low)', 'Forecast, 95 % band', 'Forecast']);
    expect(data.datasets[0].data).toHaveLength(24);
    expect(data.datasets[3].fill).toBe('-1');
  });

  it('draws the readings alone without a forecast', () => {
    expect(gravityChartData(readings, null).datasets).toHaveLength(2);
  });
});

describe('gravityChartOptions', () => {
  it('decimates long series and reads times in the co-op zone', () => {
    const options = gravityChartOptions('Europe/Berlin');
    expect(options.plugins?.decimation).toMatchObject({ enabled: true, algorithm: 'lttb' });
    expect(options.parsing).toBe(false);
    expect((options.scales?.['x'] as { adapters: { date: { zone: string } } }).adapters.date.zone).toBe('Europe/Berlin');
  });
});
