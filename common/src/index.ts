export * from './auth/permissions.js';
export * from './auth/user.js';
