export * from './profile-api';
