export * from './original-gravity';
export * from './water-volumes';
export * from './strike-temperature';
export * from './bitterness';
export * from './colour';
export * from './yeast-pitch';
