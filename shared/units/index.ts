export * from './units';
export * from './convert';
export * from './format';
export * from './measure';
