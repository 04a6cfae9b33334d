export * from './units';
export * from './convert';
export * from './format';
