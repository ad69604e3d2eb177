export * from './dues-api';
export * from './dues-plan';
export * from './dues-standing';
export * from './test-cards';
