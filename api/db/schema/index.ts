export * from './users';
export * from './engagements';
export * from './audit';
export * from './sessions';
export * from './assumptions';
export * from './studies';
export * from './mail-outbox';
