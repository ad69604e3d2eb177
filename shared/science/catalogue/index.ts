export * from './catalogue-entry';
export * from './function-catalogue';
