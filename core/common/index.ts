/** core/common: The vocabulary every layer shares: the error catalogue, size limits, physical constants, the caution, units of length and feet-inches-eighths, CSV-safe text, and the reading of typed parameters (drafts lists, density). It imports nothing else of core/. */
export * from './caution.js';
export * from './constants.js';
export * from './csvSafe.js';
export * from './decimal.js';
export * from './density.js';
export * from './draftList.js';
export * from './errors.js';
export * from './feetInches.js';
export * from './hullName.js';
export * from './lengthWords.js';
export * from './limits.js';
export * from './numberList.js';
export * from './typedLength.js';
export * from './units.js';
