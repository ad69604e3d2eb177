import { readingsFromColumns } from '@shared/readings';
import { PageReadingTuple, sourceIdsOf, toReadingColumns } from './reading-page-columns';

// Rows as the driver hands them for the page query (arrays, decimals and times as the database's text).
const byHand: PageReadingTuple = [7, '2026-11-21 08:00:00', 'refractometer', '12.400', 'brix', '19.50', null, '1.040', '12.400', '1.03120', 'hand', null, null, 'after dry hop', 3, '2026-11-21 08:01:30'];
const fromFile: PageReadingTuple = [8, '2026-11-21 08:05:00', 'hydrometer', '1.0480', 'sg', '18.00', '20.00', null, null, '1.04790', 'file', 11, null, '', 3, '2026-11-22 00:00:00'];
const pushed: PageReadingTuple = [9, '2026-11-21 08:10:00', 'logger', '1.0475', 'sg', null, null, null, null, '1.04750', 'push', null, 5, '', null, '2026-11-22 00:00:00'];
const names = { users: new Map([[3, 'Mira Holt (demo)']]), uploads: new Map([[11, 'log.csv']]), tokens: new Map([[5, 'Fermenter float']]) };

describe('toReadingColumns', () => {
  it('turns array rows into the columns the API sends, which the client turns back into the same readings', () => {
    const columns = toReadingColumns([byHand, fromFile, pushed], names);
    expect(columns.id).toEqual([7, 8, 9]);
    // The first time as it is, each next one as its difference from the one before.
    expect(columns.measuredAt).toEqual([Date.UTC(2026, 10, 21, 8) / 1000, 300, 300]);
    expect(columns.rawValue).toEqual([12.4, 1.048, 1.0475]);
    expect(columns.sampleTemperatureC).toEqual([19.5, 18, null]);
    expect(columns.sourceDetail).toEqual({ values: [null, 'log.csv', 'Fermenter float'], lengths: [1, 1, 1] });
    // Values repeated from row to row go as runs.
    expect(columns.createdByName).toEqual({ values: ['Mira Holt (demo)', null], lengths: [2, 1] });
    expect(columns.note).toEqual({ values: ['after dry hop', ''], lengths: [1, 2] });

    const readings = readingsFromColumns(4, JSON.parse(JSON.stringify(columns)));
    expect(readings[0]).toEqual({
      id: 7, batchId: 4, measuredAt: '2026-11-21T08:00:00.000Z', instrument: 'refractometer', rawValue: 12.4, rawUnit: 'brix', sampleTemperatureC: 19.5,
      calibrationTemperatureC: null, correctedSg: 1.0312, correctionFactor: 1.04, originalBrix: 12.4, source: 'hand', sourceDetail: null, note: 'after dry hop',
      createdByName: 'Mira Holt (demo)', updatedAt: '2026-11-21T08:01:30.000Z',
    });
    expect(readings[1]).toMatchObject({ measuredAt: '2026-11-21T08:05:00.000Z', calibrationTemperatureC: 20, correctionFactor: null, updatedAt: '2026-11-22T00:00:00.000Z' });
    expect(readings[2]).toMatchObject({ measuredAt: '2026-11-21T08:10:00.000Z', source: 'push', sourceDetail: 'Fermenter float', createdByName: null });
  });

  it('names a source it has no name for as null, and an empty page as empty columns', () => {
    const unnamed = toReadingColumns([fromFile], { users: new Map(), uploads: new Map(), tokens: new Map() });
    expect(readingsFromColumns(1, unnamed)[0]).toMatchObject({ sourceDetail: null, createdByName: null });
    expect(toReadingColumns([], names).id).toEqual([]);
  });
});

describe('sourceIdsOf', () => {
  it('lists each user, upload and token a page names once', () => {
    expect(sourceIdsOf([byHand, fromFile, pushed, fromFile])).toEqual({ users: [3], uploads: [11], tokens: [5] });
  });
});
