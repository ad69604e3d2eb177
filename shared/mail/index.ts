export * from './outbox-api';
