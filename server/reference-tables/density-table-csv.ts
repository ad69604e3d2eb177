import { parse } from 'csv-parse/sync';
import { DENSITY_TABLE_COLUMNS, DENSITY_TABLE_LIMITS, DENSITY_TABLE_UPLOAD, DensityTableProblem } from '@shared/reference-tables';

/** A table read from a CSV: its rows with their lines, the one temperature they share, and every bad line. */
export interface ParsedDensityTable {
  rows: { line: number; massPercent: number; density: number }[];
  temperature: number | null;
  problems: DensityTableProblem[];
}

function number(raw: string | undefined): number {
  const text = (raw ?? '').trim().replace(',', '.');
  return text === '' ? Number.NaN : Number(text);
}

function readRecords(csv: string): { record: Record<string, string>; line: number }[] | DensityTableProblem {
  try {
    const parsed = parse(csv, { columns: (h: string[]) => h.map((c) => c.trim()), skip_empty_lines: true, trim: true, info: true, bom: true }) as { record: Record<string, string>; info: { lines: number } }[];
    return parsed.map((p) => ({ record: p.record, line: p.info.lines }));
  } catch (error) {
    return { line: (error as { lines?: number }).lines ?? 1, reason: `the file is not valid CSV: ${(error as Error).message}` };
  }
}

function checkRow(record: Record<string, string>): { massPercent: number; density: number; temperature: number } | string {
  const massPercent = number(record.massPercent);
  const density = number(record.density);
  const temperature = number(record.temperature);
  const { density: d, temperature: t } = DENSITY_TABLE_LIMITS;
  if (!(massPercent >= 0 && massPercent <= 100)) return `massPercent "${record.massPercent ?? ''}" must be a number from 0 to 100`;
  if (!(density >= d.min && density <= d.max)) return `density "${record.density ?? ''}" must be a number from ${d.min} to ${d.max} kg/m³`;
  if (!(temperature >= t.min && temperature <= t.max)) return `temperature "${record.temperature ?? ''}" must be a number from ${t.min} to ${t.max} °C`;
  return { massPercent, density, temperature };
}

/** Parses a table CSV with the columns massPercent,density,temperature; all rows at one temperature. */
export function parseDensityTableCsv(csv: string): ParsedDensityTable {
  const records = readRecords(csv);
  if (!Array.isArray(records)) return { rows: [], temperature: null, problems: [records] };
  const header = Object.keys(records[0]?.record ?? {});
  const missing = DENSITY_TABLE_COLUMNS.filter((c) => !header.includes(c));
  if (records.length === 0 || missing.length) {
    return { rows: [], temperature: null, problems: [{ line: 1, reason: `the first line must name the columns ${DENSITY_TABLE_COLUMNS.join(',')}${missing.length ? ` (missing: ${missing.join(', ')})` : ''}` }] };
  }
  const result: ParsedDensityTable = { rows: [], temperature: null, problems: [] };
  const seen = new Set<number>();
  for (const { record, line } of records) {
    const row = checkRow(record);
    if (typeof row === 'string') {
      result.problems.push({ line, reason: row });
      continue;
    }
    result.temperature ??= row.temperature;
    if (Math.abs(row.temperature - result.temperature) > 1e-9) result.problems.push({ line, reason: `temperature ${row.temperature} °C differs from the table's ${result.temperature} °C; a table is at one temperature` });
    else if (seen.has(row.massPercent)) result.problems.push({ line, reason: `massPercent ${row.massPercent} appears twice` });
    else result.rows.push({ line, massPercent: row.massPercent, density: row.density });
    seen.add(row.massPercent);
  }
  const { minRows, maxRows } = DENSITY_TABLE_UPLOAD;
  if (result.problems.length === 0 && (result.rows.length < minRows || result.rows.length > maxRows)) {
    result.problems.push({ line: 1, reason: `the table has ${result.rows.length} rows; it needs ${minRows} to ${maxRows}` });
  }
  return result;
}
