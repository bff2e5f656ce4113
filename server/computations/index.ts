/**
 * The computations the service offers, in the order the API page lists them. Each is
 * one entry: a file here exporting a `Computation`, imported and added to the list.
 */
import type { AnyComputation } from './computation.js';
import { areas } from './areas.js';
import { bonjean } from './bonjean.js';
import { check } from './check.js';
import { crossCurvesComputation } from './crossCurves.js';
import { float } from './float.js';
import { gz } from './gz.js';
import { hydrostatics } from './hydrostatics.js';
import { sheet } from './sheet.js';

export const COMPUTATIONS: readonly AnyComputation[] = [hydrostatics, sheet, bonjean, areas, float, crossCurvesComputation, gz, check];
