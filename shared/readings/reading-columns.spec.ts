import { emptyReadingColumns, readingsFromColumns } from './reading-columns';

describe('readingsFromColumns', () => {
  it('adds up the time differences, in either order, into instants', () => {
    const c = emptyReadingColumns();
    const rows = [
      { id: 2, measured: Date.UTC(2026, 10, 21, 8, 5) / 1000, updated: Date.UTC(2026, 10, 22) / 1000 },
      { id: 1, measured: Date.UTC(2026, 10, 21, 8, 0) / 1000, updated: Date.UTC(2026, 10, 22) / 1000 },
    ];
    let [m, u] = [0, 0];
    for (const r of rows) {
      Object.assign(c, { id: [...c.id, r.id], measuredAt: [...c.measuredAt, r.measured - m], updatedAt: [...c.updatedAt, r.updated - u] });
      for (const key of ['instrument', 'rawUnit', 'source'] as const) (c[key] as string[]).push(key === 'instrument' ? 'logger' : key === 'rawUnit' ? 'sg' : 'push');
      for (const key of ['rawValue', 'correctedSg'] as const) c[key].push(1.05);
      for (const key of ['sampleTemperatureC', 'calibrationTemperatureC', 'correctionFactor', 'originalBrix', 'sourceDetail', 'createdByName'] as const) (c[key] as null[]).push(null);
      c.note.push('');
      [m, u] = [r.measured, r.updated];
    }
    expect(c.measuredAt).toEqual([Date.UTC(2026, 10, 21, 8, 5) / 1000, -300]);
    const read = readingsFromColumns(4, c);
    expect(read.map((r) => [r.id, r.measuredAt, r.updatedAt])).toEqual([
      [2, '2026-11-21T08:05:00.000Z', '2026-11-22T00:00:00.000Z'],
      [1, '2026-11-21T08:00:00.000Z', '2026-11-22T00:00:00.000Z'],
    ]);
    expect(read[0]).toMatchObject({ batchId: 4, instrument: 'logger', rawValue: 1.05, source: 'push', sampleTemperatureC: null });
  });
});
