export * from './api-error.js';
export * from './roles.js';
export * from './auth.js';
export * from './process.js';
export * from './compute.js';
