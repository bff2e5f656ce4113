/**
 * Simpson's multipliers as the trade writes them: a multiplier that is a small fraction
 * to rounding (4.0000000000000036, 1.4999999999999998) is that fraction exactly, so a
 * sheet shows and a spreadsheet receives 4 and 1.5. Denominators up to 24 cover the
 * halved and quartered end intervals, the 3/8 rule and its halves. Common practice, no
 * source.
 */

/** Denominators tried, smallest first. */
export const MULTIPLIER_DENOMINATORS = [1, 2, 3, 4, 6, 8, 12, 16, 24] as const;

/** Relative difference within which a multiplier is taken to be its fraction. */
const ROUNDING = 1e-9;

/**
 * The multiplier, or the nearest fraction with a denominator of 24 or less when it lies
 * within rounding of one.
 * @example cleanMultiplier(4.0000000000000036) // 4
 * @example cleanMultiplier(1.2345678) // 1.2345678
 */
export function cleanMultiplier(m: number): number {
  if (!Number.isFinite(m)) return m;
  for (const d of MULTIPLIER_DENOMINATORS) {
    const num = Math.round(m * d);
    if (Math.abs(m * d - num) <= ROUNDING * Math.max(1, Math.abs(m * d))) return num / d;
  }
  return m;
}
