import { createSelector } from '@ngrx/store';
import { selectVisibleNavItems } from '@app/core/nav.selectors';
import { batchesFeature } from '@app/batches/state/batches.feature';

/** The areas that get a card on Today: every area the person may open, except Today itself. */
export const selectTodayAreaCards = createSelector(selectVisibleNavItems, (items) =>
  items.filter((item) => item.path !== '/today'),
);

/** The person's active batches once loaded for Today; null while they load. */
export const selectMyActiveBatches = createSelector(batchesFeature.selectAll, batchesFeature.selectMine, batchesFeature.selectListLoading, (batches, mine, loading) =>
  mine && !loading ? batches : null,
);
