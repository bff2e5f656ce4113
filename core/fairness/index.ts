/** core/fairness: The fairness check of the offsets: offsets that look unfair, each with a suggested fair value. It may import the layers below it (common, quadrature, hull, offsets). */
export * from './fairness.js';
export * from './fairnessInFile.js';
