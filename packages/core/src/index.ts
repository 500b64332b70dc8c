export * from './units/length';
