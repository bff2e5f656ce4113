/** core/stability: the hull at any waterplane (trim and heel), level drafts for displacements, the floating position for a load, cross curves, righting levers and the intact-stability criteria. It may import every layer below it (common, quadrature, hull, offsets, fairness, upright). */
export * from './criteria.js';
export * from './crossCurves.js';
export * from './floatingPosition.js';
export * from './heeledFloat.js';
export * from './inclinedHydrostatics.js';
export * from './levelDrafts.js';
export * from './rightingLevers.js';
export * from './solveVolume.js';
export * from './stabilityInput.js';
export * from './trimmedHydrostatics.js';
