export * from './types.js';
export * from './schemas.js';
