/**
 * The computations the service offers, in the order the API page lists them. Each is
 * one entry: the sheet, Bonjean and sectional-area computations of core join here as
 * they are wired (`import { sheet } from './sheet.js'` and add it to the list).
 */
import type { AnyComputation } from './computation.js';
import { check } from './check.js';
import { hydrostatics } from './hydrostatics.js';

export const COMPUTATIONS: readonly AnyComputation[] = [hydrostatics, check];
