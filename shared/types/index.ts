export * from './plan-request';
export * from './plan';
