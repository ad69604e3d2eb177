// @shared/science: the brewing science core, pure functions only. Each concept's index lists its
// functions with a one-line summary; the catalogue describes them for the calc command line.
export * from './units';
export * from './water-density';
export * from './gravity';
export * from './ethanol-water';
export * from './strength';
export * from './recipe';
export * from './carbonation';
export * from './uncertainty';
export * from './table-audit';
export * from './catalogue';
