export * from './auth';
export * from './network';
export * from './work';
export * from './imports';
export * from './policies';
export * from './plans';
export * from './signoff';
export * from './idempotency';
