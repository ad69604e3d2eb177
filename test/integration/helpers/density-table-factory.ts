import { builtinDensityTable } from '@shared/reference-tables';

/**
 * A density table CSV printed from the OIML R 22 equation at t to 0.01 kg/m³ every 5 % mass, with
 * one row mistyped by `typoBy` kg/m³ when asked (at 45 % mass).
 */
export function densityTableCsv(temperature = 20, typoBy = 0): string {
  const lines = builtinDensityTable(temperature, 5).map((row) => {
    const density = row.density + (row.massPercent === 45 ? typoBy : 0);
    return `${row.massPercent},${density.toFixed(2)},${temperature}`;
  });
  return ['massPercent,density,temperature', ...lines].join('\n') + '\n';
}
