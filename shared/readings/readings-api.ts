import { GravityUnit, Instrument, ReadingInput } from './gravity-reading';
import { ReadingColumns } from './reading-columns';

export const READINGS_PATH = '/api/readings';
export const READINGS_PUSH_PATH = '/api/readings/push';

/** Columns the readings table can be sorted by. */
export const READING_SORT_COLUMNS = ['measuredAt', 'correctedSg', 'instrument'] as const;
export type ReadingSortColumn = (typeof READING_SORT_COLUMNS)[number];

/** What an edit of a reading may change: temperatures and note; the value as read stays as read. */
export type ReadingChangesRequest = Partial<Pick<ReadingInput, 'sampleTemperatureC' | 'calibrationTemperatureC' | 'note'>>;

/** One page of a batch's readings, column by column (`readingsFromColumns` gives the rows). */
export interface ReadingPage {
  batchId: number;
  total: number;
  offset: number;
  columns: ReadingColumns;
}

/** How an upload treats bad rows: refuse the whole file, or import the good rows and report the rest. */
export const IMPORT_MODES = ['all-or-nothing', 'good-rows-only'] as const;
export type ImportMode = (typeof IMPORT_MODES)[number];

/** Which header names hold what; instrument and unit may be fixed for the whole file instead. */
export interface ReadingColumnMapping {
  time: string;
  value: string;
  temperature: string | null;
  instrument: string | null;
  unit: string | null;
  /** Used when the file has no instrument column. */
  fixedInstrument: Instrument;
  /** Used when the file has no unit column. */
  fixedUnit: GravityUnit;
}

/** The columns a file exported from the log has, and the default mapping of an upload. */
export const DEFAULT_READING_COLUMNS: ReadingColumnMapping = {
  time: 'time',
  value: 'value',
  temperature: 'temperature_c',
  instrument: 'instrument',
  unit: 'unit',
  fixedInstrument: 'logger',
  fixedUnit: 'sg',
};

/** A line of the file that was not imported, and why. */
export interface ImportLineProblem {
  /** Line number in the file, the header being line 1. */
  line: number;
  reason: string;
}

/** What an upload found and did; with `dryRun` nothing is stored. */
export interface ReadingImportResult {
  dryRun: boolean;
  mode: ImportMode;
  rowsTotal: number;
  imported: number;
  /** Good rows that were not imported (all-or-nothing with bad rows present, or a dry run). */
  notImported: number;
  duplicates: ImportLineProblem[];
  problems: ImportLineProblem[];
}

/** One reading a logger sends; its device time makes a retry harmless. */
export interface PushedReading {
  deviceTime: string;
  value: number;
  unit?: 'sg' | 'plato';
  temperatureC?: number | null;
}

export interface PushReadingsRequest {
  readings: PushedReading[];
}

export interface PushReadingsResult {
  stored: number;
  alreadyPresent: number;
}

/** A push token as listed (the token itself is never shown again). */
export interface PushTokenSummary {
  id: number;
  label: string;
  createdAt: string;
  lastUsedAt: string | null;
  revokedAt: string | null;
}

export interface CreatePushTokenRequest {
  label: string;
}

/** The new token, shown this once. */
export interface IssuedPushToken extends PushTokenSummary {
  token: string;
}
