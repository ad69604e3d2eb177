export * from './brew-schedule';
export * from './brew-plan-limits';
export * from './busy-interval';
export * from './slot-placement';
export * from './zone-days';
export * from './propose-slots';
export * from './utilisation';
export * from './brew-plan-api';
