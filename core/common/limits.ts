/**
 * Documented size limits for one hull. They bound memory and time for the service and
 * keep a mistyped file from hanging the command line. The minimum the project promises
 * is 2,000 stations by 500 waterlines; the limits sit above it.
 */
export const LIMITS = {
  /** Most stations in one hull. */
  maxStations: 5_000,
  /** Most waterlines in a grid file (header cells after `x`). */
  maxWaterlines: 1_000,
  /** Most points in one station's section (points form). */
  maxPointsPerStation: 2_000,
  /** Most points in one hull, all stations together (2,000 x 500 = 1,000,000 fits). */
  maxPoints: 2_500_000,
  /** Longest hull name, characters. */
  maxNameLength: 200,
  /** Most drafts in one hydrostatic table request. */
  maxDrafts: 2_000,
} as const;
