export * from './science-range-error';
export * from './range-guard';
export * from './unit-types';
export * from './unit-conversions';
