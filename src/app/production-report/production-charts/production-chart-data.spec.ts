import { generateMockProductionReport } from '@app/testing/production-report-mock';
import { litresChartData, monthLabel, statusChartData, utilisationChartData } from './production-chart-data';

describe('production chart data', () => {
  const report = generateMockProductionReport();

  it('labels each month in words and charts the litres brewed', () => {
    expect(monthLabel('2026-10')).toBe('Oct 2026');
    expect(litresChartData(report)).toMatchObject({ labels: ['Oct 2026', 'Nov 2026'], datasets: [{ label: 'Litres brewed', data: [73, 0] }] });
  });

  it('stacks the batches by status, one dataset per status in the order of a batch’s life', () => {
    const data = statusChartData(report);
    expect(data.datasets.map((d) => d.label)).toEqual(['Planned', 'Brewing', 'Fermenting', 'Conditioning', 'Packaged', 'Archived']);
    expect(data.datasets[2].data).toEqual([1, 1]);
  });

  it('gives the room’s use and maintenance in percent to one decimal', () => {
    expect(utilisationChartData(report).datasets.map((d) => d.data)).toEqual([
      [41.9, 60.7],
      [0, 3.6],
    ]);
  });
});
