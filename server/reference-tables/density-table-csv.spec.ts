import { parseDensityTableCsv } from './density-table-csv';

const header = 'massPercent,density,temperature';
const rows = (n: number) => Array.from({ length: n }, (_, i) => `${i * 5},${(998.2 - i * 10).toFixed(2)},20`);

describe('parseDensityTableCsv', () => {
  it('reads rows with their lines and the shared temperature', () => {
    const result = parseDensityTableCsv([header, ...rows(12)].join('\n'));
    expect(result.problems).toEqual([]);
    expect(result.temperature).toBe(20);
    expect(result.rows[1]).toEqual({ line: 3, massPercent: 5, density: 988.2 });
  });

  it('reports each bad line with its reason', () => {
    const lines = [header, ...rows(12)];
    lines[3] = '10,lots,20';
    lines[5] = '20,978.2,25';
    const result = parseDensityTableCsv(lines.join('\n'));
    expect(result.problems.map((p) => p.line)).toEqual([4, 6]);
    expect(result.problems[0].reason).toMatch(/density "lots"/);
    expect(result.problems[1].reason).toMatch(/one temperature/);
  });

  it('asks for the named columns', () => {
    expect(parseDensityTableCsv('a,b\n1,2\n').problems[0].reason).toMatch(/massPercent,density,temperature/);
  });

  it('refuses a table too short to audit', () => {
    expect(parseDensityTableCsv([header, ...rows(5)].join('\n')).problems[0].reason).toMatch(/5 rows/);
  });
});
