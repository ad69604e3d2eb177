import { ethanolWaterDensity, excessMolarVolumeFromDensities, moleFractionFromMassFraction, TableAudit } from '../science';
import { fittedVolume } from '../science/table-audit/audit-fit';

/** A point of a chart: mole fraction of ethanol and excess molar volume, cm³/mol. */
export interface ExcessVolumePoint { x: number; y: number }

/**
 * The fitted Redlich–Kister curve as excess molar volume against mole fraction, over the pure
 * volumes the audit's rows use, so the rows and the curve share one scale. The audit fits per gram
 * against mass fraction (its default), hence density = 1000 / V(z).
 */
export function auditFittedCurve(audit: TableAudit, temperature: number, points = 100): ExcessVolumePoint[] {
  const pureEthanol = audit.rows.find((r) => r.massPercent === 100)?.density ?? ethanolWaterDensity(1, temperature);
  const pureWater = audit.rows.find((r) => r.massPercent === 0)?.density ?? ethanolWaterDensity(0, temperature);
  return Array.from({ length: points + 1 }, (_, i) => {
    const z = i / points;
    const x = moleFractionFromMassFraction(z);
    const density = 1000 / fittedVolume(audit.fit, z);
    return { x, y: excessMolarVolumeFromDensities(x, density, pureEthanol, pureWater) };
  });
}
