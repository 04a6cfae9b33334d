export * from './plan-request';
export * from './plan';
export * from './plan-edit';
export * from './plan-rules';
export * from './plan-pitch';
export * from './api';
export * from './plan-api';
export * from './rule-set-api';
