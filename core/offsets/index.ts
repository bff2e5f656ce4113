/** core/offsets: Offsets files in and out: the grid and points CSV forms, their metadata and cells, JSON hull models, writing a hull back as CSV. It may import core/common/, core/quadrature/ and core/hull/. */
export * from './lengthCell.js';
export * from './headerUnit.js';
export * from './offsetsGrid.js';
export * from './offsetsIssue.js';
export * from './offsetsMetadata.js';
export * from './offsetsPlaces.js';
export * from './offsetsPoints.js';
export * from './offsetsSheet.js';
export * from './readHullJson.js';
export * from './readOffsets.js';
export * from './writeOffsets.js';
