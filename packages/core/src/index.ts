export * from './units/length';
export * from './indexing';
