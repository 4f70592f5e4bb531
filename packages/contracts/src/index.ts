export * from './auth';
export * from './errors';
export * from './vin';
export * from './vehicles';
export * from './cases';
export * from './findings';
export * from './case-detail';
export * from './trees';
