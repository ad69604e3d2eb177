export * from './member';
export * from './members-api';
