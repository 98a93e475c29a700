export * from './users';
export * from './engagements';
export * from './audit';
export * from './sessions';
