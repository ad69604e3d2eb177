import { auditDensityTable } from '@shared/science';
import { auditFittedCurve, builtinDensityTable } from '@shared/reference-tables';
import { excessVolumeChartData } from './excess-volume-chart-data';

describe('excessVolumeChartData', () => {
  it('puts a suspect row in its own dataset beside the fitted curve', () => {
    // OIML R 22 at 20 °C printed to 0.01 kg/m³, with the 45 % mass row mistyped by +0.9 kg/m³.
    const table = builtinDensityTable(20, 5).map((r) => ({ massPercent: r.massPercent, density: Math.round(100 * (r.density + (r.massPercent === 45 ? 0.9 : 0))) / 100 }));
    const audit = auditDensityTable(table, 20);

    const data = excessVolumeChartData(audit.rows, auditFittedCurve(audit, 20));

    expect(data.datasets.map((d) => d.data.length)).toEqual([20, 1, 101]);
    expect(data.datasets[1].data[0]).toEqual({ x: audit.flagged[0].moleFraction, y: audit.flagged[0].excessMolarVolume });
  });
});
