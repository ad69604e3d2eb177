export * from './gravity-reading';
export * from './reading-limits';
export * from './instrument-resolution';
export * from './corrected-gravity';
export * from './fermentation-flags';
export * from './fermentation-progress';
export * from './readings-api';
export * from './reading-columns';
