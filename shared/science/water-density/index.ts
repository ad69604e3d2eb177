export * from './tanaka-water-density';
