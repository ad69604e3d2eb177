import { emptyReadingColumns, readingsFromColumns } from './reading-columns';
import { addToRuns } from './value-runs';

describe('readingsFromColumns', () => {
  it('adds up the time differences, in either order, into instants, and spreads the runs over their rows', () => {
    const c = emptyReadingColumns();
    const rows = [
      { id: 2, measured: Date.UTC(2026, 10, 21, 8, 5) / 1000, updated: Date.UTC(2026, 10, 22) / 1000, instrument: 'logger' as const, note: '' },
      { id: 1, measured: Date.UTC(2026, 10, 21, 8, 0) / 1000, updated: Date.UTC(2026, 10, 22) / 1000, instrument: 'hydrometer' as const, note: 'checked by hand' },
    ];
    let [m, u] = [0, 0];
    for (const r of rows) {
      c.id.push(r.id);
      c.measuredAt.push(r.measured - m);
      c.updatedAt.push(r.updated - u);
      c.rawValue.push(1.05);
      c.correctedSg.push(1.05);
      c.sampleTemperatureC.push(null);
      addToRuns(c.instrument, r.instrument);
      addToRuns(c.rawUnit, 'sg');
      addToRuns(c.source, 'push');
      addToRuns(c.note, r.note);
      for (const key of ['calibrationTemperatureC', 'correctionFactor', 'originalBrix'] as const) addToRuns(c[key], null);
      for (const key of ['sourceDetail', 'createdByName'] as const) addToRuns(c[key], null);
      [m, u] = [r.measured, r.updated];
    }
    expect(c.measuredAt).toEqual([Date.UTC(2026, 10, 21, 8, 5) / 1000, -300]);
    expect(c.rawUnit).toEqual({ values: ['sg'], lengths: [2] });
    const read = readingsFromColumns(4, c);
    expect(read.map((r) => [r.id, r.measuredAt, r.updatedAt, r.instrument, r.note])).toEqual([
      [2, '2026-11-21T08:05:00.000Z', '2026-11-22T00:00:00.000Z', 'logger', ''],
      [1, '2026-11-21T08:00:00.000Z', '2026-11-22T00:00:00.000Z', 'hydrometer', 'checked by hand'],
    ]);
    expect(read[1]).toMatchObject({ batchId: 4, rawUnit: 'sg', rawValue: 1.05, source: 'push', sampleTemperatureC: null, createdByName: null });
  });
});
