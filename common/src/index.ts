export * from './auth/permissions.js';
export * from './auth/user.js';
export * from './geo/index.js';
export * from './physics/index.js';
export * from './compute/index.js';
export * from './uploads/index.js';
export * from './library/index.js';
export * from './links/index.js';
