/** core/hull: The hull model (one zod schema) and its geometric rules, fitted sections, the prepared hull and its wetted-surface slope factors. It may import core/common/ and core/quadrature/. */
export * from './hullModel.js';
export * from './hullRules.js';
export * from './preparedHull.js';
export * from './section.js';
export * from './wettedSurface.js';
