export * from './batch-history';
export * from './production-report';
export * from './production-report-api';
export * from './production-report-limits';
export * from './report-months';
