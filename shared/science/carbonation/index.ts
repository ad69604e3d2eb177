export * from './co2-solubility';
export * from './priming';
export * from './keg-pressure';
