export * from './api-error';
