export * from './checks';
export * from './schema';
