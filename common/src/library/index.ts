export * from './profile-library.js';
