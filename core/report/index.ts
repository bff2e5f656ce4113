/** core/report: Presentation of results: JSON and CSV forms, text tables, Simpson's multipliers as the trade writes them, imperial conversion and the hydrostatic report. It may import every layer below it. */
export * from './formatAreas.js';
export * from './formatBonjean.js';
export * from './formatHydrostatics.js';
export * from './formatSheet.js';
export * from './hydrostaticsReport.js';
export * from './imperial.js';
export * from './multiplierText.js';
export * from './textTable.js';
