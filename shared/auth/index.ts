export * from './role';
export * from './session-user';
export * from './auth-api';
