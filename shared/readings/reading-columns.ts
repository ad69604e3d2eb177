import { GravityReading, GravityUnit, Instrument, ReadingSource } from './gravity-reading';
import { emptyRuns, expandRuns, ValueRuns } from './value-runs';

/**
 * A page of readings column by column. A logger writes tens of thousands of rows per batch, and one
 * array per field instead of one object per row keeps the response small and cheap to write and
 * read. Fields whose values mostly repeat from row to row go as runs (`ValueRuns`). Times are whole
 * seconds since 1970, each written as its difference from the one before (the first as it is): a
 * logger's rows a few minutes apart then cost a few digits.
 */
export interface ReadingColumns {
  id: number[];
  measuredAt: number[];
  instrument: ValueRuns<Instrument>;
  rawValue: number[];
  rawUnit: ValueRuns<GravityUnit>;
  sampleTemperatureC: (number | null)[];
  calibrationTemperatureC: ValueRuns<number | null>;
  correctedSg: number[];
  correctionFactor: ValueRuns<number | null>;
  originalBrix: ValueRuns<number | null>;
  source: ValueRuns<ReadingSource>;
  sourceDetail: ValueRuns<string | null>;
  note: ValueRuns<string>;
  createdByName: ValueRuns<string | null>;
  updatedAt: number[];
}

/** Empty columns, to fill row by row. */
export function emptyReadingColumns(): ReadingColumns {
  return {
    id: [], measuredAt: [], instrument: emptyRuns(), rawValue: [], rawUnit: emptyRuns(), sampleTemperatureC: [], calibrationTemperatureC: emptyRuns(), correctedSg: [],
    correctionFactor: emptyRuns(), originalBrix: emptyRuns(), source: emptyRuns(), sourceDetail: emptyRuns(), note: emptyRuns(), createdByName: emptyRuns(), updatedAt: [],
  };
}

/** The readings of a page as one object each, for the table and the forms. */
export function readingsFromColumns(batchId: number, columns: ReadingColumns): GravityReading[] {
  const c = {
    ...columns,
    instrument: expandRuns(columns.instrument), rawUnit: expandRuns(columns.rawUnit), calibrationTemperatureC: expandRuns(columns.calibrationTemperatureC),
    correctionFactor: expandRuns(columns.correctionFactor), originalBrix: expandRuns(columns.originalBrix), source: expandRuns(columns.source),
    sourceDetail: expandRuns(columns.sourceDetail), note: expandRuns(columns.note), createdByName: expandRuns(columns.createdByName),
  };
  let measured = 0;
  let updated = 0;
  return c.id.map((id, i) => ({
    id,
    batchId,
    measuredAt: new Date((measured += c.measuredAt[i]) * 1000).toISOString(),
    instrument: c.instrument[i],
    rawValue: c.rawValue[i],
    rawUnit: c.rawUnit[i],
    sampleTemperatureC: c.sampleTemperatureC[i],
    calibrationTemperatureC: c.calibrationTemperatureC[i],
    correctedSg: c.correctedSg[i],
    correctionFactor: c.correctionFactor[i],
    originalBrix: c.originalBrix[i],
    source: c.source[i],
    sourceDetail: c.sourceDetail[i],
    note: c.note[i],
    createdByName: c.createdByName[i],
    updatedAt: new Date((updated += c.updatedAt[i]) * 1000).toISOString(),
  }));
}
