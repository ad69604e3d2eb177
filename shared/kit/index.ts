export * from './kit-item';
export * from './kit-limits';
export * from './maintenance-entry';
export * from './kit-api';
