/**
 * The pure computational core of Halfbreadth: no file, network or process I/O.
 * Folders are layers, lowest first: common, quadrature, hull, offsets, fairness, upright,
 * stability, report, plots, document. A file imports only from its own folder or a lower
 * one; test/architecture/layering.test.ts keeps it so.
 */
export * from './common/index.js';
export * from './quadrature/index.js';
export * from './hull/index.js';
export * from './offsets/index.js';
export * from './fairness/index.js';
export * from './upright/index.js';
export * from './stability/index.js';
export * from './report/index.js';
export * from './plots/index.js';
export * from './document/index.js';
