export * from './great-circle.js';
export * from './solar.js';
