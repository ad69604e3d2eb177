import { GravityReading } from '@shared/readings';
import { GravityLogPageActions } from './gravity-log-page.actions';
import { ReadingsApiActions } from './readings-api.actions';
import { initialReadingsState, readingsFeature } from './readings.feature';

const reduce = readingsFeature.reducer;
const reading = (id: number, overrides: Partial<GravityReading> = {}): GravityReading => ({
  id, batchId: 3, measuredAt: '2026-11-21T08:00:00.000Z', instrument: 'hydrometer', rawValue: 1.05, rawUnit: 'sg', sampleTemperatureC: 20, calibrationTemperatureC: 20,
  correctedSg: 1.05, correctionFactor: null, originalBrix: null, source: 'hand', sourceDetail: null, note: '', createdByName: 'Test brewer', updatedAt: '2026-11-21T08:00:00.000Z',
  ...overrides,
});
const loaded = (items: GravityReading[], total = items.length) =>
  reduce(reduce(initialReadingsState, GravityLogPageActions.opened({ batchId: 3 })), ReadingsApiActions.readingsLoadedSuccess({ page: { total, offset: 0, items } }));

describe('readings feature', () => {
  it('keeps a page in the server\'s order with the total, and starts afresh for another batch', () => {
    const state = loaded([reading(9), reading(4)], 40);
    expect(state.ids).toEqual([9, 4]);
    expect(state).toMatchObject({ total: 40, loading: false, batchId: 3 });
    const other = reduce(state, GravityLogPageActions.opened({ batchId: 8 }));
    expect(other.ids).toEqual([]);
    expect(other.batchId).toBe(8);
  });

  it('goes back to the first page when the sort changes', () => {
    const paged = reduce(loaded([reading(1)]), GravityLogPageActions.pageChanged({ pageIndex: 3, pageSize: 50 }));
    const sorted = reduce(paged, GravityLogPageActions.sortChanged({ sort: 'correctedSg', direction: 'asc' }));
    expect(sorted).toMatchObject({ pageIndex: 0, pageSize: 50, sort: 'correctedSg', direction: 'asc', loading: true });
  });

  it('puts a corrected reading in place of the old one, the raw value as read', () => {
    const state = reduce(loaded([reading(1), reading(2)]), ReadingsApiActions.readingEditedSuccess({ reading: reading(2, { sampleTemperatureC: 24, correctedSg: 1.0508 }) }));
    expect(state.ids).toEqual([1, 2]);
    expect(state.entities[2]).toMatchObject({ rawValue: 1.05, sampleTemperatureC: 24, correctedSg: 1.0508 });
  });

  it('counts a deleted reading out of the total, and clears the form after a stored one', () => {
    const deleted = reduce(loaded([reading(1), reading(2)], 2), ReadingsApiActions.readingDeletedSuccess({ readingId: 1 }));
    expect(deleted.ids).toEqual([2]);
    expect(deleted.total).toBe(1);
    const saved = reduce(reduce(deleted, GravityLogPageActions.readingSubmitted({ batchId: 3, input: reading(5) })), ReadingsApiActions.readingAddedSuccess({ reading: reading(5) }));
    expect(saved).toMatchObject({ saving: false, savedRevision: 1 });
  });

  it('keeps the field reasons of a refused reading', () => {
    const refused = reduce(loaded([]), ReadingsApiActions.readingAddedFailure({ message: 'Please check these fields: rawValue.', fields: { rawValue: 'too high' } }));
    expect(refused).toMatchObject({ saving: false, fieldErrors: { rawValue: 'too high' } });
  });
});
