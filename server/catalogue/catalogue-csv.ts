import { parse } from 'csv-parse/sync';
import { CATALOGUE_CSV_COLUMNS, CatalogueImportProblem } from '@shared/recipes';
import { CatalogueKind } from './catalogue-kinds';

/** Rows of a catalogue CSV that passed validation, with the line of the file each came from. */
export interface ParsedCatalogueCsv {
  rows: { line: number; entry: Record<string, unknown> }[];
  problems: CatalogueImportProblem[];
}

function toValue(spec: CatalogueKind, field: string, raw: string): unknown {
  if (!spec.numericFields.includes(field)) return raw;
  if (raw.trim() === '') return null;
  return Number(raw.replace(',', '.'));
}

function readRecords(csv: string): { records: { record: Record<string, string>; line: number }[]; header: string[] } | CatalogueImportProblem {
  try {
    const parsed = parse(csv, { columns: true, skip_empty_lines: true, trim: true, info: true, bom: true }) as {
      record: Record<string, string>;
      info: { lines: number };
    }[];
    const header = parse(csv, { to_line: 1, trim: true, bom: true })[0] as string[] | undefined;
    return { records: parsed.map((p) => ({ record: p.record, line: p.info.lines })), header: header ?? [] };
  } catch (error) {
    const line = (error as { lines?: number }).lines ?? 1;
    return { line, reason: `the file is not valid CSV: ${(error as Error).message}` };
  }
}

/** Parses and validates a CSV whose header names the entry's fields (e.g. name,kind,extractPercent,…). */
export function parseCatalogueCsv(spec: CatalogueKind, csv: string): ParsedCatalogueCsv {
  const read = readRecords(csv);
  if ('reason' in read) return { rows: [], problems: [read] };
  const expected = [...CATALOGUE_CSV_COLUMNS[spec.kind]];
  const missing = expected.filter((field) => !read.header.includes(field));
  const unknown = read.header.filter((field) => !expected.includes(field));
  if (missing.length || unknown.length) {
    const parts = [missing.length ? `missing columns: ${missing.join(', ')}` : '', unknown.length ? `unknown columns: ${unknown.join(', ')}` : ''];
    return { rows: [], problems: [{ line: 1, reason: `${parts.filter(Boolean).join('; ')} (expected ${expected.join(',')})` }] };
  }
  const result: ParsedCatalogueCsv = { rows: [], problems: [] };
  const seen = new Set<string>();
  for (const { record, line } of read.records) {
    const input = Object.fromEntries(expected.map((field) => [field, toValue(spec, field, record[field] ?? '')]));
    const checked = spec.schema.safeParse(input);
    if (!checked.success) {
      result.problems.push({ line, reason: checked.error.issues.map((i) => `${i.path.join('.')} ${i.message}`).join('; ') });
      continue;
    }
    const key = String(checked.data.name).toLowerCase();
    if (seen.has(key)) result.problems.push({ line, reason: `name "${checked.data.name}" appears twice in the file` });
    seen.add(key);
    result.rows.push({ line, entry: checked.data });
  }
  return result;
}
