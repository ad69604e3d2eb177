import { DEFAULT_READING_COLUMNS, ReadingColumnMapping } from '@shared/readings';

/** Splits one CSV line into fields, honouring double quotes (enough for a preview). */
export function splitCsvLine(line: string): string[] {
  const fields: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (quoted && c === '"' && line[i + 1] === '"') {
      field += '"';
      i++;
    } else if (c === '"') {
      quoted = !quoted;
    } else if (c === ',' && !quoted) {
      fields.push(field.trim());
      field = '';
    } else {
      field += c;
    }
  }
  fields.push(field.trim());
  return fields;
}

/** The header and the first rows of a file's beginning. */
export function previewCsv(start: string, rows = 5): { header: string[]; rows: string[][] } {
  const lines = start.replace(/^\uFEFF/, '').split(/\r?\n/).filter((line) => line.trim() !== '');
  return { header: lines.length ? splitCsvLine(lines[0]) : [], rows: lines.slice(1, rows + 1).map(splitCsvLine) };
}

/** A first guess at which column holds what, from the header's names. */
export function guessMapping(header: readonly string[]): ReadingColumnMapping {
  const find = (pattern: RegExp) => header.find((name) => pattern.test(name)) ?? null;
  return {
    ...DEFAULT_READING_COLUMNS,
    time: find(/time|date/i) ?? header[0] ?? DEFAULT_READING_COLUMNS.time,
    value: find(/^value$|gravity|^sg$|plato|brix|density/i) ?? header[1] ?? DEFAULT_READING_COLUMNS.value,
    temperature: find(/temp/i),
    instrument: find(/instrument/i),
    unit: find(/^unit$/i),
  };
}
