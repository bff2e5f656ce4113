/** core/upright: Upright computations: the hydrostatic table and its fields, particulars from length integrals, Bonjean data, sectional areas, the calculation sheets and the integration-error estimate. It may import the layers below it (common, quadrature, hull, offsets, fairness). */
export * from './bonjean.js';
export * from './calculationSheet.js';
export * from './errorEstimate.js';
export * from './formedRows.js';
export * from './hydrostaticFields.js';
export * from './hydrostatics.js';
export * from './particulars.js';
export * from './sectionalAreaCurve.js';
export * from './verticalSheet.js';
