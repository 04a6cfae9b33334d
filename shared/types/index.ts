export * from './plan-request';
export * from './plan';
export * from './api';
