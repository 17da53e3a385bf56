export * from './common';
export * from './errors';
export * from './families';
export * from './health';
export * from './outbox';
export * from './family-upload';
export * from './auth';
