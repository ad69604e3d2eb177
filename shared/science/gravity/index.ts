export * from './plato';
export * from './brix';
export * from './gravity-reference';
export * from './refractometer';
