import { GravityReading, GravityUnit, Instrument, ReadingSource } from './gravity-reading';

/**
 * A page of readings column by column. A logger writes tens of thousands of rows per batch, and one
 * array per field instead of one object per row keeps the response about a fifth of the size and
 * cheap to write and read. Times are whole seconds since 1970, each written as its difference from
 * the one before (the first as it is): a logger's rows a few minutes apart then cost a few digits.
 */
export interface ReadingColumns {
  id: number[];
  measuredAt: number[];
  instrument: Instrument[];
  rawValue: number[];
  rawUnit: GravityUnit[];
  sampleTemperatureC: (number | null)[];
  calibrationTemperatureC: (number | null)[];
  correctedSg: number[];
  correctionFactor: (number | null)[];
  originalBrix: (number | null)[];
  source: ReadingSource[];
  sourceDetail: (string | null)[];
  note: string[];
  createdByName: (string | null)[];
  updatedAt: number[];
}

/** Empty columns, to fill row by row. */
export function emptyReadingColumns(): ReadingColumns {
  return {
    id: [], measuredAt: [], instrument: [], rawValue: [], rawUnit: [], sampleTemperatureC: [], calibrationTemperatureC: [], correctedSg: [],
    correctionFactor: [], originalBrix: [], source: [], sourceDetail: [], note: [], createdByName: [], updatedAt: [],
  };
}

/** The readings of a page as one object each, for the table and the forms. */
export function readingsFromColumns(batchId: number, c: ReadingColumns): GravityReading[] {
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
