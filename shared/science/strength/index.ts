export * from './attenuation';
export * from './balling';
export * from './abv-estimates';
export * from './density-abv';
