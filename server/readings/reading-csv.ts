import { parse } from 'csv-parse/sync';
import { DateTime } from 'luxon';
import { GravityUnit, ImportLineProblem, Instrument, ReadingColumnMapping, ReadingInput } from '@shared/readings';
import { readingInputSchema } from './readings.schemas';

/** Rows of a readings file that passed the checks, each with its line, and the lines that did not. */
export interface ParsedReadingsCsv {
  rows: { line: number; input: ReadingInput }[];
  problems: ImportLineProblem[];
  rowsTotal: number;
}

const UNIT_NAMES: Record<string, GravityUnit> = { sg: 'sg', plato: 'plato', '°p': 'plato', p: 'plato', brix: 'brix', '°bx': 'brix', bx: 'brix', 'kg-m3': 'kg-m3', 'kg/m3': 'kg-m3', 'kg/m³': 'kg-m3' };
const INSTRUMENT_NAMES: Record<string, Instrument> = {
  hydrometer: 'hydrometer', refractometer: 'refractometer', 'density-meter': 'density-meter', 'density meter': 'density-meter', 'digital density meter': 'density-meter', logger: 'logger',
};
const LOCAL_FORMATS = ['yyyy-MM-dd HH:mm:ss', 'yyyy-MM-dd HH:mm', "yyyy-MM-dd'T'HH:mm:ss", "yyyy-MM-dd'T'HH:mm"];

/** A time with an offset as given; one without is wall-clock time in the co-op's zone. */
export function parseReadingTime(text: string, zone: string): string | null {
  const withOffset = DateTime.fromISO(text, { setZone: true });
  if (withOffset.isValid && /(Z|[+-]\d\d:?\d\d)$/i.test(text)) return withOffset.toUTC().toISO();
  for (const format of LOCAL_FORMATS) {
    const local = DateTime.fromFormat(text, format, { zone });
    if (local.isValid) return local.toUTC().toISO();
  }
  return null;
}

function number(text: string | undefined): number | null {
  if (text === undefined || text.trim() === '') return null;
  const value = Number(text.trim().replace(',', '.'));
  return Number.isFinite(value) ? value : NaN;
}

function rowToInput(record: Record<string, string>, map: ReadingColumnMapping, zone: string): ReadingInput | string {
  const time = parseReadingTime(record[map.time] ?? '', zone);
  if (!time) return `${map.time}: "${record[map.time] ?? ''}" is not a date and time (use 2026-12-02 14:30 or ISO 8601)`;
  const instrumentText = map.instrument ? (record[map.instrument] ?? '').toLowerCase() : map.fixedInstrument;
  const instrument = INSTRUMENT_NAMES[instrumentText];
  if (!instrument) return `${map.instrument}: "${instrumentText}" is not an instrument (hydrometer, refractometer, density-meter, logger)`;
  const unitText = map.unit ? (record[map.unit] ?? '').toLowerCase() : map.fixedUnit;
  const unit = UNIT_NAMES[unitText];
  if (!unit) return `${map.unit}: "${unitText}" is not a unit (sg, plato, brix, kg/m3)`;
  const value = number(record[map.value]);
  if (value === null || Number.isNaN(value)) return `${map.value}: "${record[map.value] ?? ''}" is not a number`;
  const temperature = map.temperature ? number(record[map.temperature]) : null;
  if (Number.isNaN(temperature)) return `${map.temperature}: "${record[map.temperature!]}" is not a number`;
  const input = { measuredAt: time, instrument, rawValue: value, rawUnit: unit, sampleTemperatureC: temperature, calibrationTemperatureC: null };
  const checked = readingInputSchema.safeParse(input);
  if (!checked.success) return checked.error.issues.map((i) => `${i.path.join('.')} ${i.message}`).join('; ');
  return input;
}

/** Reads a readings CSV: every line is either a reading or a problem naming the line and the reason. */
export function parseReadingsCsv(text: string, map: ReadingColumnMapping, zone: string): ParsedReadingsCsv {
  let records: { record: Record<string, string>; info: { lines: number } }[];
  let header: string[];
  try {
    header = (parse(text, { to_line: 1, trim: true, bom: true })[0] as string[] | undefined) ?? [];
    records = parse(text, { columns: true, skip_empty_lines: true, trim: true, info: true, bom: true, relax_column_count: true });
  } catch (error) {
    return { rows: [], rowsTotal: 0, problems: [{ line: (error as { lines?: number }).lines ?? 1, reason: `the file is not valid CSV: ${(error as Error).message}` }] };
  }
  // The temperature column is optional: a file without it has readings without a sample temperature.
  if (map.temperature !== null && !header.includes(map.temperature)) map = { ...map, temperature: null };
  const wanted = [map.time, map.value, map.instrument, map.unit].filter((c): c is string => c !== null);
  const missing = wanted.filter((c) => !header.includes(c));
  if (missing.length) return { rows: [], rowsTotal: records.length, problems: [{ line: 1, reason: `missing columns: ${missing.join(', ')} (the header has ${header.join(', ') || 'nothing'})` }] };
  const rows: ParsedReadingsCsv['rows'] = [];
  const problems: ImportLineProblem[] = [];
  for (const { record, info } of records) {
    const result = rowToInput(record, map, zone);
    if (typeof result === 'string') problems.push({ line: info.lines, reason: result });
    else rows.push({ line: info.lines, input: result });
  }
  return { rows, problems, rowsTotal: records.length };
}
