import { auditDensityTable, DensityTableRow } from './reference-table-audit';
import { ethanolWaterDensity } from '../ethanol-water/oiml-density';
import { ScienceRangeError } from '../units/science-range-error';

// Fixtures: tables at 1 % mass steps printed to 0.01 kg/m³, computed from the OIML R 22 equation
// (as a published table is). The expectations are which rows are flagged, not figures of the audit.
function oimlTable(temperature: number): DensityTableRow[] {
  return Array.from({ length: 101 }, (_, i) => ({
    massPercent: i,
    density: Math.round(ethanolWaterDensity(i / 100, temperature) * 100) / 100,
  }));
}

function withDensity(table: DensityTableRow[], index: number, density: number): DensityTableRow[] {
  return table.map((row, i) => (i === index ? { ...row, density } : row));
}

function flaggedRows(table: DensityTableRow[], temperature: number): number[] {
  return auditDensityTable(table, temperature).flagged.map((r) => r.massPercent);
}

/** Every distinct value made by swapping two adjacent digits of a density printed to 0.01. */
function adjacentSwaps(density: number): number[] {
  const digits = density.toFixed(2).replace('.', '');
  const out: number[] = [];
  for (let i = 0; i + 1 < digits.length; i++) {
    if (digits[i] === digits[i + 1]) continue;
    const swapped = digits.slice(0, i) + digits[i + 1] + digits[i] + digits.slice(i + 2);
    out.push(Number(swapped) / 100);
  }
  return out;
}

describe('auditDensityTable', () => {
  it.each([10, 15, 20, 25, 30, 35, 40])('flags nothing in the clean table at %p °C', (t) => {
    expect(flaggedRows(oimlTable(t), t)).toEqual([]);
  });

  it.each([10, 25, 40])('flags exactly the row mistyped by ±0.3 kg/m³, at every position from 5 to 95 %% mass, at %p °C', (t) => {
    const clean = oimlTable(t);
    const misses: string[] = [];
    for (let i = 5; i <= 95; i++) {
      for (const delta of [0.3, -0.3]) {
        const flagged = flaggedRows(withDensity(clean, i, clean[i].density + delta), t);
        if (flagged.length !== 1 || flagged[0] !== i) misses.push(`${i} % ${delta}: ${flagged.join(',')}`);
      }
    }
    expect(misses).toEqual([]);
  });

  it.each([15, 30])('flags exactly the row mistyped by ±1 kg/m³, at every position from 2 to 98 %% mass, at %p °C', (t) => {
    const clean = oimlTable(t);
    const misses: string[] = [];
    for (let i = 2; i <= 98; i++) {
      for (const delta of [1, -1]) {
        const flagged = flaggedRows(withDensity(clean, i, clean[i].density + delta), t);
        if (flagged.length !== 1 || flagged[0] !== i) misses.push(`${i} % ${delta}: ${flagged.join(',')}`);
      }
    }
    expect(misses).toEqual([]);
  });

  it.each([20, 35])('flags exactly the row with two adjacent digits swapped, at every position from 2 to 98 %% mass, at %p °C', (t) => {
    const clean = oimlTable(t);
    const misses: string[] = [];
    for (let i = 2; i <= 98; i++) {
      for (const typo of adjacentSwaps(clean[i].density)) {
        const flagged = flaggedRows(withDensity(clean, i, typo), t);
        if (flagged.length !== 1 || flagged[0] !== i) misses.push(`${i} % ${typo}: ${flagged.join(',')}`);
      }
    }
    expect(misses).toEqual([]);
  });

  it('reports the bump in cm³/mol and a density that restores the printed value within 0.02 kg/m³', () => {
    const clean = oimlTable(20);
    const [row] = auditDensityTable(withDensity(clean, 40, clean[40].density + 0.3), 20).flagged;
    expect(Math.abs(row.suggestedDensity - clean[40].density)).toBeLessThan(0.02);
    // A denser row means a smaller molar volume: the bump is negative, about −M/ρ² × 0.3 × 1000.
    expect(row.bumpCm3PerMol).toBeLessThan(0);
  });

  it('gives every row its mole fraction, pure-component volumes and a negative excess molar volume between the ends', () => {
    const rows = auditDensityTable(oimlTable(20), 20).rows;
    expect(rows[0].excessMolarVolume).toBeCloseTo(0, 9);
    expect(rows[100].excessMolarVolume).toBeCloseTo(0, 9);
    expect(rows.slice(1, 100).every((r) => r.excessMolarVolume < 0)).toBe(true);
    // 18.015 g/mol ÷ 0.99820 g/cm³ = 18.05 cm³/mol, 46.069 ÷ 0.78924 = 58.37 cm³/mol (OIML R 22 pure densities, from memory).
    expect(rows[0].waterMolarVolume).toBeCloseTo(18.047, 2);
    expect(rows[0].ethanolMolarVolume).toBeCloseTo(58.371, 2);
  });

  it('flags a mid-table mistype also when the expansion runs in mole fraction', () => {
    const clean = oimlTable(20);
    const flagged = auditDensityTable(withDensity(clean, 30, clean[30].density - 0.3), 20, { composition: 'mole' }).flagged;
    expect(flagged.map((r) => r.massPercent)).toEqual([30]);
  });

  it('throws a ScienceRangeError for a table too short to audit', () => {
    expect(() => auditDensityTable(oimlTable(20).slice(0, 5), 20)).toThrow(ScienceRangeError);
  });
});
