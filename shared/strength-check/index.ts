export * from './strength-conversion';
export * from './tolerance-classes-api';
export * from './batch-strength';
export * from './batch-strength-api';
export * from './distillate-with-table';
export * from './distillate-analyses-api';
