/**
 * Documented limits, declared once. The size limits bound memory and time for the
 * service and keep a mistyped file from hanging the command line. The minimum the
 * project promises is 2,000 stations by 500 waterlines; the limits sit above it.
 * The physical limits keep every number that comes in within a range where no
 * integral of a hull can overflow a double: with every length within 10 km, a volume is
 * below 1e13 m3 and a second moment of a waterplane below 1e17 m4. README's "Limits"
 * lists these with the status each gets.
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
  /** Most displacements in one list (cross curves, a table by displacement). */
  maxDisplacements: 200,
  /** Most heels in one list: every 5 degrees over a whole turn is 73. */
  maxHeels: 73,
  /** Most points of one set of cross curves, displacements x heels: each floats the hull once or more. */
  maxCrossCurvePoints: 2_000,
  /** Most openings (downflooding points) of one loading. */
  maxOpenings: 50,
  /** Largest input read, bytes: an offsets file on the command line, a request body in the service (16 MiB). */
  maxInputBytes: 16 * 1024 * 1024,
} as const;

/**
 * Physical limits on numbers that come in, in SI units after any conversion of units.
 * A length (station x, half-breadth, height, perpendicular, waterline, draft) lies
 * within +-10 km of the origin: the largest ships are under 500 m long, so 10 km leaves
 * room for any frame origin and any typing of units, and still keeps every integral
 * finite (common practice, no source).
 */
export const PHYSICAL_LIMITS = {
  /** Largest magnitude of a length, m. */
  maxLength: 10_000,
  /**
   * Least interval between neighbouring stations and between neighbouring waterlines of a
   * grid, m: 1 mm. Closer ones are a typing error (a slipped exponent), and would make
   * Simpson's weights and the slopes of the surface overflow (common practice, no source).
   */
  minSpacing: 0.001,
} as const;

/** True when `v` is a finite length within PHYSICAL_LIMITS.maxLength of the origin. */
export function lengthInRange(v: number): boolean {
  return Math.abs(v) <= PHYSICAL_LIMITS.maxLength;
}
