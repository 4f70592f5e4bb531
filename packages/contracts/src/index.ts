export * from './auth';
export * from './errors';
