/** core/report: Presentation of results: the shared output step (units, fields, digits, plain header; answerForm.ts), JSON and CSV forms, text tables, Simpson's multipliers as the trade writes them, imperial conversion. It may import every layer below it. */
export * from './answerForm.js';
export * from './formatAreas.js';
export * from './formatBonjean.js';
export * from './formatHydrostatics.js';
export * from './formatSheet.js';
export * from './formatStability.js';
export * from './formatTrimmed.js';
export * from './imperial.js';
export * from './multiplierText.js';
export * from './outputOptions.js';
export * from './resultParts.js';
export * from './textTable.js';
export * from './unitConversion.js';
