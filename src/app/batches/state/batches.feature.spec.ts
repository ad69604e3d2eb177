import { Batch, BatchSummary } from '@shared/batches';
import { TodayPageActions } from '@app/today/state/today-page.actions';
import { BatchPageActions } from './batch-page.actions';
import { BatchesApiActions } from './batches-api.actions';
import { batchesFeature, initialBatchesState } from './batches.feature';
import { selectMyActiveBatches } from '@app/today/today.selectors';

const reduce = batchesFeature.reducer;
const summary = (id: number, brewDate: string): BatchSummary => ({
  id, name: `Batch ${id}`, status: 'fermenting', brewerId: 1, brewerName: 'Test brewer', brewDate, plannedVolumeLitres: 20, fermenterId: null, fermenterCode: null,
  recipeId: null, recipeVersion: null, forecast: null,
  progress: { latestSg: null, latestAt: null, readingCount: 0, apparentAttenuationPercent: null, abvSoFar: null, finished: false, stuck: false },
});
const batch = (id: number) => ({ ...summary(id, '2026-11-20'), editable: true }) as Batch;

describe('batches feature', () => {
  it('keeps the list newest brew first and answers Today only once its own list has loaded', () => {
    const opened = reduce(initialBatchesState, TodayPageActions.opened());
    expect(selectMyActiveBatches.projector([], true, true)).toBeNull();
    const loaded = reduce(opened, BatchesApiActions.batchesLoadedSuccess({ batches: [summary(1, '2026-10-01'), summary(2, '2026-11-01')] }));
    expect(loaded.ids).toEqual([2, 1]);
    expect(loaded.mine).toBe(true);
    expect(loaded.listLoading).toBe(false);
  });

  it('marks a details save as busy, keeps the saved batch, and keeps the field reasons of a refusal', () => {
    const saving = reduce({ ...initialBatchesState, current: batch(5) }, BatchPageActions.detailsSubmitted({ batchId: 5, changes: { name: 'Renamed' } }));
    expect(saving).toMatchObject({ saving: true, fieldErrors: null });
    const saved = reduce(saving, BatchesApiActions.batchChangedSuccess({ batch: { ...batch(5), name: 'Renamed' }, message: 'Batch details saved.' }));
    expect(saved.current?.name).toBe('Renamed');
    expect(saved.saving).toBe(false);
    const refused = reduce(saving, BatchesApiActions.batchChangedFailure({ message: 'Please check these fields: name.', fields: { name: 'must not be empty' } }));
    expect(refused).toMatchObject({ saving: false, fieldErrors: { name: 'must not be empty' } });
  });

  it('waits for the confirmation before a skipping move is busy, and is busy at once for a single step', () => {
    const skipping = reduce(initialBatchesState, BatchPageActions.statusMoveChosen({ batchId: 5, status: 'packaged', skipped: ['brewing'], at: null }));
    expect(skipping.saving).toBe(false);
    const single = reduce(initialBatchesState, BatchPageActions.statusMoveChosen({ batchId: 5, status: 'brewing', skipped: [], at: '2026-11-20T08:00:00.000Z' }));
    expect(single.saving).toBe(true);
  });

  it('keeps the brewer and fermenter choices of the details form', () => {
    const state = reduce(initialBatchesState, BatchesApiActions.editChoicesLoadedSuccess({ brewers: [{ id: 1, name: 'Test brewer' }], fermenters: [] }));
    expect(state.brewers).toEqual([{ id: 1, name: 'Test brewer' }]);
  });
});
