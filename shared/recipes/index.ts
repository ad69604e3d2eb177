export * from './ingredient';
export * from './style-target';
export * from './brewhouse-settings';
export * from './recipe-design';
export * from './recipe';
export * from './recipes-api';
