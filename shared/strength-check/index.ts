export * from './strength-conversion';
export * from './tolerance-classes-api';
