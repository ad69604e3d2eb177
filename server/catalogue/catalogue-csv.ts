import { parse } from 'csv-parse/sync';
import { CATALOGUE_CSV_COLUMNS, CatalogueImportProblem } from '@shared/recipes';
import { CatalogueKind } from './catalogue-kinds';

/** Rows of a catalogue CSV that passed validation, with the line of the file each came from. */
export interface ParsedCatalogueCsv {
  rows: { line: number; entry: Record<string, unknown> }[];
  problems: CatalogueImportProblem[];
}

// Plain decimals only, with a point or a comma: "0x10", "1e3", "Infinity" and "12abc" are refused,
// though Number() would take some of them.
const DECIMAL = /^[+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)$/;

function toValue(spec: CatalogueKind, field: string, raw: string): unknown {
  if (!spec.numericFields.includes(field)) return raw;
  const text = raw.trim();
  if (text === '') return null;
  return DECIMAL.test(text) ? Number(text.replace(',', '.')) : text;
}

type Record_ = { record: string[]; info: { lines: number } };

const PARSE_OPTIONS = { skip_empty_lines: true, trim: true, info: true, bom: true, relax_column_count: true } as const;

/**
 * The file read one physical line at a time: used when the whole file cannot be read (a quote that
 * is never closed swallows the rest of the file), so the other lines are still checked and reported.
 */
function readLineByLine(csv: string): { records: { fields: string[]; line: number }[]; problems: CatalogueImportProblem[] } {
  const records: { fields: string[]; line: number }[] = [];
  const problems: CatalogueImportProblem[] = [];
  csv.split(/\r?\n/).forEach((text, i) => {
    if (text.trim() === '') return;
    try {
      const [first] = parse(text, PARSE_OPTIONS) as unknown as Record_[];
      if (first) records.push({ fields: first.record, line: i + 1 });
    } catch (error) {
      const unclosed = (error as { code?: string }).code === 'CSV_QUOTE_NOT_CLOSED';
      problems.push({ line: i + 1, reason: unclosed ? 'this line is not valid CSV: it opens a quote that is never closed' : `this line is not valid CSV: ${(error as Error).message}` });
    }
  });
  return { records, problems };
}

/** Every record of the file with its line; records the parser cannot read become problems, and reading goes on. */
function readRecords(csv: string): { records: { fields: string[]; line: number }[]; problems: CatalogueImportProblem[] } {
  const problems: CatalogueImportProblem[] = [];
  let unclosedQuote = false;
  try {
    const parsed = parse(csv, {
      ...PARSE_OPTIONS,
      skip_records_with_error: true,
      on_skip: (error: { lines?: number; message: string; code?: string } | undefined) => {
        if (error?.code === 'CSV_QUOTE_NOT_CLOSED') unclosedQuote = true;
        else if (error) problems.push({ line: error.lines ?? 1, reason: `this line is not valid CSV: ${error.message}` });
      },
    }) as unknown as Record_[];
    // An unclosed quote took every line after it into one broken record: read the lines on their own.
    if (unclosedQuote) return readLineByLine(csv);
    return { records: parsed.map((p) => ({ fields: p.record, line: p.info.lines })), problems };
  } catch {
    return readLineByLine(csv);
  }
}

/** Parses and validates a CSV whose header names the entry's fields; every bad row is reported by its line. */
export function parseCatalogueCsv(spec: CatalogueKind, csv: string): ParsedCatalogueCsv {
  const read = readRecords(csv);
  const [headerRecord, ...dataRecords] = read.records;
  const header = headerRecord?.fields ?? [];
  const expected = [...CATALOGUE_CSV_COLUMNS[spec.kind]];
  const missing = expected.filter((field) => !header.includes(field));
  const unknown = header.filter((field) => !expected.includes(field));
  if (missing.length || unknown.length) {
    const parts = [missing.length ? `missing columns: ${missing.join(', ')}` : '', unknown.length ? `unknown columns: ${unknown.join(', ')}` : ''];
    return { rows: [], problems: [{ line: 1, reason: `${parts.filter(Boolean).join('; ')} (expected ${expected.join(',')})` }] };
  }
  const result: ParsedCatalogueCsv = { rows: [], problems: [...read.problems] };
  for (const { fields, line } of dataRecords) {
    if (fields.length !== header.length) {
      result.problems.push({ line, reason: `has ${fields.length} values where the header names ${header.length} columns` });
      continue;
    }
    const input = Object.fromEntries(expected.map((field) => [field, toValue(spec, field, fields[header.indexOf(field)] ?? '')]));
    const checked = spec.schema.safeParse(input);
    if (!checked.success) {
      result.problems.push({ line, reason: checked.error.issues.map((i) => `${i.path.join('.')} ${i.message}`).join('; ') });
      continue;
    }
    result.rows.push({ line, entry: checked.data });
  }
  result.problems.sort((a, b) => a.line - b.line);
  return result;
}
