export * from './measurement-uncertainty';
export * from './strength-uncertainty';
