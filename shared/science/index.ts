export * from './units';
export * from './water-density';
export * from './gravity';
export * from './ethanol-water';
export * from './strength';
export * from './catalogue';
