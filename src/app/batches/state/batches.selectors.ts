import { createSelector } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { batchesFeature } from './batches.feature';

export const selectBatchListViewModel = createSelector(
  batchesFeature.selectAll,
  batchesFeature.selectMine,
  batchesFeature.selectListLoading,
  batchesFeature.selectListError,
  (batches, mine, loading, error) => ({ batches, mine, loading, error }),
);

export const selectBatchStartViewModel = createSelector(
  batchesFeature.selectRecipes,
  batchesFeature.selectFermenters,
  batchesFeature.selectVersions,
  batchesFeature.selectSaving,
  batchesFeature.selectFieldErrors,
  authFeature.selectUser,
  authFeature.selectCoopTimeZone,
  (recipes, fermenters, versions, saving, fieldErrors, user, coopTimeZone) => ({ recipes, fermenters, versions, saving, fieldErrors, brewerName: user?.name ?? '', coopTimeZone }),
);

export const selectBatchPageViewModel = createSelector(
  batchesFeature.selectCurrent,
  batchesFeature.selectCurrentLoading,
  batchesFeature.selectCurrentError,
  batchesFeature.selectSaving,
  batchesFeature.selectFieldErrors,
  authFeature.selectCoopTimeZone,
  batchesFeature.selectBrewers,
  batchesFeature.selectFermenters,
  (batch, loading, error, saving, fieldErrors, coopTimeZone, brewers, fermenters) => ({ batch, loading, error, saving, fieldErrors, coopTimeZone, brewers, fermenters }),
);
