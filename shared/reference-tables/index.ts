export * from './reference-tables-api';
export * from './builtin-density-table';
export * from './audit-curve';
