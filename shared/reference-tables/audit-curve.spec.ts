import { auditDensityTable } from '../science';
import { auditFittedCurve } from './audit-curve';
import { builtinDensityTable } from './builtin-density-table';

// A table printed from the OIML R 22 equation at 20 °C to 0.01 kg/m³, with one mistyped row.
function printedTable(typo: { massPercent: number; by: number } | null) {
  return builtinDensityTable(20, 5).map((row) => ({
    massPercent: row.massPercent,
    density: Math.round(100 * (row.density + (typo && row.massPercent === typo.massPercent ? typo.by : 0))) / 100,
  }));
}

describe('builtinDensityTable', () => {
  // OIML R 22 (1975) at 20 °C (from memory): water 998.20, ethanol 789.24 kg/m³.
  it('prints the pure ends of the equation at 20 °C', () => {
    const rows = builtinDensityTable(20, 10);
    expect(rows).toHaveLength(11);
    expect(rows[0].density).toBeCloseTo(998.2, 1);
    expect(rows[10].density).toBeCloseTo(789.24, 1);
  });
});

describe('auditFittedCurve', () => {
  it('passes through the excess volumes of a clean table', () => {
    const audit = auditDensityTable(printedTable(null), 20);
    const curve = auditFittedCurve(audit, 20, 20);
    // Every 5 % mass on the curve matches a row: the curve is the rows' own fit.
    audit.rows.forEach((row, i) => expect(curve[i].y).toBeCloseTo(row.excessMolarVolume, 2));
    // Excess molar volume of ethanol–water is negative, about −1.1 cm³/mol at its deepest (from memory).
    expect(Math.min(...curve.map((p) => p.y))).toBeLessThan(-0.9);
  });

  it('leaves a mistyped row off the curve, flagged with the density that removes its bump', () => {
    const audit = auditDensityTable(printedTable({ massPercent: 45, by: 0.9 }), 20);
    const flagged = audit.flagged.map((r) => r.massPercent);
    expect(flagged).toEqual([45]);
    const row = audit.flagged[0];
    expect(row.suggestedDensity).toBeCloseTo(row.density - 0.9, 1);
  });
});
