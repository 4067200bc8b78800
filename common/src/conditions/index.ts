export * from './diurnal-model.js';
export * from './plan.js';
