/**
 * Simpson's rules and their relatives, as weights on ordinates.
 *
 * Method: the ordinates are split into panels. Two intervals make a first-rule
 * (Simpson's 1/3) panel; when the number of intervals is odd, the last three make a
 * second-rule (Simpson's 3/8) panel; a single interval is a trapezoid. Each panel's
 * weights integrate exactly the polynomial through its ordinates (a parabola through
 * three, a cubic through four), so the rule works unchanged on uneven spacing (half
 * stations at the ends, closer waterlines near the keel).
 *
 * Exactness: quadratics on any spacing (three or more ordinates); cubics wherever each
 * first-rule panel has equal intervals (always so on even spacing). Error order h^4.
 *
 * References: C. B. Barrass & D. R. Derrett, Ship Stability for Masters and Mates,
 * 7th ed. (Butterworth-Heinemann, 2012), ch. 10 (Simpson's first, second and
 * 5,8,-1 rules); P. J. Davis & P. Rabinowitz, Methods of Numerical Integration,
 * 2nd ed. (Academic Press, 1984), sec. 2.1 (Newton-Cotes closed rules).
 *
 * @example
 * simpsonWeights([0, 1, 2]) // Float64Array [1/3, 4/3, 1/3]
 */

/** One panel of a composite rule: ordinates `start` .. `start + size - 1`. */
export interface Panel {
  readonly start: number;
  /** 2 (trapezoid), 3 (first rule) or 4 (second rule) ordinates. */
  readonly size: 2 | 3 | 4;
}

/**
 * How `count` ordinates are split into panels: first-rule pairs of intervals, with a
 * second-rule panel of three intervals at the end when the number of intervals is odd.
 * 0 or 1 ordinates give no panel; 2 give one trapezoid.
 */
export function simpsonPanels(count: number): Panel[] {
  const panels: Panel[] = [];
  const intervals = count - 1;
  if (intervals < 1) return panels;
  if (intervals === 1) return [{ start: 0, size: 2 }];
  const pairs = intervals % 2 === 0 ? intervals / 2 : (intervals - 3) / 2;
  for (let p = 0; p < pairs; p++) panels.push({ start: 2 * p, size: 3 });
  if (intervals % 2 === 1) panels.push({ start: 2 * pairs, size: 4 });
  return panels;
}

// Gauss-Legendre nodes and weights on [0, 1], three points: exact to degree 5, enough
// for integrating a cubic Lagrange basis polynomial.
const GL3_T = [0.5 - Math.sqrt(15) / 10, 0.5, 0.5 + Math.sqrt(15) / 10];
const GL3_W = [5 / 18, 8 / 18, 5 / 18];

/**
 * Weights of the ordinates of one panel (2 to 4 abscissae): the integral over the
 * panel of each Lagrange basis polynomial. Adds into `out` at `out[outOffset + k]`.
 */
function addPanelWeights(x: ArrayLike<number>, start: number, size: number, out: Float64Array): void {
  const a = x[start]!;
  const b = x[start + size - 1]!;
  const span = b - a;
  // Trapezoid and first-rule panels in closed form, so that equal intervals give the
  // trade's h/2, h/2 and h/3, 4h/3, h/3 to the last digit (the quadrature below leaves
  // ulps of rounding, which would show as multipliers like 0.9999999999999978).
  if (size === 2) {
    out[start]! += span / 2;
    out[start + 1]! += span / 2;
    return;
  }
  if (size === 3) {
    // Integrals of the Lagrange basis over [x0, x2], intervals h1 and h2.
    const h1 = x[start + 1]! - a;
    const h2 = b - x[start + 1]!;
    out[start]! += (span * (2 * h1 - h2)) / (6 * h1);
    out[start + 1]! += (span * span * span) / (6 * h1 * h2);
    out[start + 2]! += (span * (2 * h2 - h1)) / (6 * h2);
    return;
  }
  for (let g = 0; g < 3; g++) {
    const t = a + GL3_T[g]! * span;
    const wg = GL3_W[g]! * span;
    for (let k = 0; k < size; k++) {
      let basis = 1;
      const xk = x[start + k]!;
      for (let m = 0; m < size; m++) {
        if (m !== k) basis *= (t - x[start + m]!) / (xk - x[start + m]!);
      }
      out[start + k]! += wg * basis;
    }
  }
}

/**
 * Composite Simpson weights for ordinates at abscissae `x` (strictly increasing, any
 * spacing): the integral is the dot product of weights and ordinates.
 * 0 or 1 abscissae give zero weights (an integral over no length is 0).
 */
export function simpsonWeights(x: ArrayLike<number>): Float64Array {
  const out = new Float64Array(x.length);
  for (const p of simpsonPanels(x.length)) addPanelWeights(x, p.start, p.size, out);
  return out;
}

/**
 * Dot product of `count` weights with a strided view of `values`:
 * sum of w[k] * values[offset + k * stride]. A waterline of a row-major offsets table
 * is the view with stride = number of waterlines and offset = its column.
 */
export function integrateWeighted(
  weights: ArrayLike<number>,
  values: ArrayLike<number>,
  count = weights.length,
  stride = 1,
  offset = 0,
): number {
  let sum = 0;
  for (let k = 0, i = offset; k < count; k++, i += stride) sum += weights[k]! * values[i]!;
  return sum;
}

/** Integral of ordinates `y` at abscissae `x` by the composite rule of `simpsonWeights`. */
export function simpson(x: ArrayLike<number>, y: ArrayLike<number>): number {
  return integrateWeighted(simpsonWeights(x), y, x.length);
}

/**
 * Simpson's first rule on `count` equally spaced ordinates `h` apart (strided view):
 * h/3 (y0 + 4y1 + 2y2 + ... + 4y(n-2) + y(n-1)). Needs an odd count of at least 3.
 * Exact for cubics; error O(h^4).
 * @example simpson13(0.5, [0, 0.25, 1]) // 1/3, the integral of x^2 over [0, 1]
 */
export function simpson13(h: number, y: ArrayLike<number>, count = y.length, stride = 1, offset = 0): number {
  if (count < 3 || count % 2 === 0) throw new RangeError(`Simpson's first rule needs an odd number of ordinates (3 or more), got ${count}`);
  let sum = y[offset]! + y[offset + (count - 1) * stride]!;
  for (let k = 1; k < count - 1; k++) sum += (k % 2 === 1 ? 4 : 2) * y[offset + k * stride]!;
  return (h / 3) * sum;
}

/**
 * Simpson's second (three-eighths) rule on `count` = 3k + 1 equally spaced ordinates:
 * 3h/8 (y0 + 3y1 + 3y2 + 2y3 + ... + y(n-1)). Exact for cubics; error O(h^4).
 * @example simpson38(1, [0, 1, 8, 27]) // 20.25, the integral of x^3 over [0, 3]
 */
export function simpson38(h: number, y: ArrayLike<number>, count = y.length, stride = 1, offset = 0): number {
  if (count < 4 || (count - 1) % 3 !== 0) throw new RangeError(`Simpson's second rule needs 3k + 1 ordinates (4, 7, 10 ...), got ${count}`);
  let sum = y[offset]! + y[offset + (count - 1) * stride]!;
  for (let k = 1; k < count - 1; k++) sum += (k % 3 === 0 ? 2 : 3) * y[offset + k * stride]!;
  return ((3 * h) / 8) * sum;
}

/**
 * Simpson's 5,8,-1 rule: the area over the first of two equal intervals h under the
 * parabola through three ordinates, h/12 (5y0 + 8y1 - y2). Exact for quadratics.
 */
export function simpson58m1(h: number, y0: number, y1: number, y2: number): number {
  return (h / 12) * (5 * y0 + 8 * y1 - y2);
}

/** The trapezoidal rule on any spacing, for comparison: exact for straight lines, error O(h^2). */
export function trapezoid(x: ArrayLike<number>, y: ArrayLike<number>): number {
  let sum = 0;
  for (let k = 1; k < x.length; k++) sum += 0.5 * (x[k]! - x[k - 1]!) * (y[k]! + y[k - 1]!);
  return sum;
}

/**
 * The trade's Simpson's multipliers for abscissae `x`: each weight divided by h/3, with
 * h the most common interval (stated with the result). Equal spacing gives
 * 1, 4, 2, 4, ..., 4, 1; halved end intervals give 1/2, 2, 1 1/2, 4, ...
 */
export function simpsonMultipliers(x: ArrayLike<number>): { spacing: number; multipliers: Float64Array } {
  const spacing = commonSpacing(x);
  const w = simpsonWeights(x);
  const multipliers = new Float64Array(w.length);
  for (let k = 0; k < w.length; k++) multipliers[k] = spacing > 0 ? w[k]! / (spacing / 3) : 0;
  return { spacing, multipliers };
}

/**
 * The most common interval of `x` (intervals equal to 9 significant figures count as
 * one); the largest when all differ. The interval returned is one of those actually
 * found, not its 9-figure rounding, so multipliers on equal spacing come out whole.
 */
export function commonSpacing(x: ArrayLike<number>): number {
  const counts = new Map<number, number>();
  let best = 0;
  let bestKey = 0;
  let bestCount = 0;
  for (let k = 1; k < x.length; k++) {
    const d = x[k]! - x[k - 1]!;
    const key = Number(d.toPrecision(9));
    const c = (counts.get(key) ?? 0) + 1;
    counts.set(key, c);
    if (c > bestCount || (c === bestCount && key > bestKey)) {
      best = d;
      bestKey = key;
      bestCount = c;
    }
  }
  return best;
}
