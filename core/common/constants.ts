/** Physical constants and defaults, each declared once with its unit and source. */

/** Density of sea water, t/m³. Common practice for hydrostatic tables (no source beyond the trade's habit). */
export const SEA_WATER_DENSITY = 1.025;

/** Density of fresh water, t/m³. Common practice, no source. */
export const FRESH_WATER_DENSITY = 1.0;

/** Range of water densities accepted, t/m³: anything outside is a typing error, not water. */
export const DENSITY_RANGE = { min: 0.9, max: 1.1 } as const;
