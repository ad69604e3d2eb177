export * from './batch-status';
export * from './batch-limits';
export * from './batch';
export * from './batches-api';
