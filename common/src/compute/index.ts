export * from './schemas.js';
export * from './run.js';
