export * from './parse-upload.js';
