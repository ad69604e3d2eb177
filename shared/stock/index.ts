export * from './stock-lot';
export * from './stock-limits';
export * from './stock-units';
export * from './batch-bill';
export * from './draw-plan';
export * from './shopping-list';
export * from './stock-alerts';
export * from './stock-api';
