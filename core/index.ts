/** The pure computational core of Halfbreadth: no file, network or process I/O. */
export * from './errors.js';
export * from './limits.js';
export * from './constants.js';
export * from './caution.js';
export * from './hullModel.js';
export * from './hullRules.js';
export * from './simpson.js';
export * from './section.js';
export * from './preparedHull.js';
export * from './hydrostaticFields.js';
export * from './hydrostatics.js';
export * from './draftList.js';
export * from './csvSafe.js';
export * from './formatHydrostatics.js';
