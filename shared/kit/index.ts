export * from './kit-item';
