/** core/plots: Plots as SVG text from plain data (the lines, curves of form, Bonjean, sectional areas, cross curves, GZ), with d3-scale, d3-shape and d3-array. It may import every layer below it (common to report). */
export * from './axes.js';
export * from './bonjeanPlot.js';
export * from './crossCurvesPlot.js';
export * from './curvesOfFormPlot.js';
export * from './gzPlot.js';
export * from './legend.js';
export * from './linesData.js';
export * from './linesPlot.js';
export * from './plotCatalogue.js';
export * from './scaleText.js';
export * from './sectionalAreaPlot.js';
export * from './stabilityShapes.js';
export * from './svg.js';
