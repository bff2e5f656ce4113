/**
 * How a run of stations is split into Simpson panels along the length, so that the
 * multipliers stay in the trade's set and no weight is ever negative.
 *
 * Method:
 * 1. The run is cut wherever the station spacing changes by more than a factor of
 *    two (`STEP_RATIO`): no panel straddles such a step. A panel across it would fit a
 *    parabola or cubic to ordinates of very different spacing, which gives weights
 *    below zero (for three ordinates h1, h2 the end weight is span(2h1 - h2)/(6h1)) and
 *    a large error where the hull changes shape at the step.
 * 2. Within each part, panels are chosen to keep the trade's rules where the spacing
 *    allows: equal intervals in pairs take the first rule (1, 4, 1), a run of equal
 *    intervals with an odd count ends with one second-rule panel (1, 3, 3, 1); where the
 *    spacing is uneven, four ordinates take the cubic through them (exact for cubics on
 *    any spacing) when its weights are all positive, else three take the parabola
 *    (exact for quadratics; its weights are positive while the two intervals differ by
 *    no more than a factor of two). A part of a single interval is left as such
 *    (`single`): the caller integrates it with a middle ordinate of its own (core/
 *    upright/waterlinePlan.ts reads one from the section interpolated between the two
 *    stations) or, with nothing else to go on, by the trapezoidal rule.
 *    The choice is the cheapest cover of the part by panels, costs in the order above,
 *    found by dynamic programming; among equal covers, pairs come first so that a
 *    second-rule panel falls at the end of its run, as on a hand sheet.
 * 3. Intervals that agree to `EQUAL_SPACING` (relative) are equal: the small
 *    differences that unit conversion and decimal positions leave (0.6096 ft-derived
 *    metres, 2.1 - 1.4) do not turn a first-rule panel into an uneven one, and its
 *    weights are the trade's h/3 (1, 4, 1) with h the panel's mean interval.
 *
 * Exactness: first- and second-rule panels and cubic panels integrate cubics exactly;
 * uneven three-ordinate panels integrate quadratics exactly; a single interval by the
 * trapezoidal rule integrates straight lines exactly.
 *
 * References: C. B. Barrass & D. R. Derrett, Ship Stability for Masters and Mates, 7th
 * ed. (Butterworth-Heinemann, 2012), ch. 10 (first and second rules, half ordinates);
 * P. J. Davis & P. Rabinowitz, Methods of Numerical Integration, 2nd ed. (Academic
 * Press, 1984), sec. 2.1 (interpolatory rules on given abscissae). The cost ordering
 * and the step ratio are common practice, no source.
 *
 * @example
 * lengthPanels([0, 3, 6, 9, 12, 15, 18, 21, 24, 27, 28, 29]).map((p) => p.rule)
 * // ['first', 'first', 'first', 'second', 'first']
 */

/** Spacing changes larger than this factor cut the run: no panel straddles them. */
export const STEP_RATIO = 2;

/** Intervals equal to this relative difference count as equal. */
export const EQUAL_SPACING = 1e-6;

export type LengthRule = 'first' | 'second' | 'cubic' | 'parabola' | 'single';

/** One panel: ordinates `start` .. `start + size - 1` of the abscissae given. */
export interface LengthPanel {
  readonly start: number;
  /** Ordinates in the panel: 2 (a single interval), 3 or 4. */
  readonly size: 2 | 3 | 4;
  readonly rule: LengthRule;
  /** Weight of each ordinate of the panel (a single interval: the trapezoid's, h/2 each), m. */
  readonly weights: readonly number[];
}

/** Plain words for each rule, for a calculation sheet. */
export const LENGTH_RULE_TEXT: Readonly<Record<LengthRule, string>> = {
  first: "Simpson's first rule (1, 4, 1)",
  second: "Simpson's second rule (1, 3, 3, 1)",
  cubic: 'the cubic through four unevenly spaced ordinates',
  parabola: 'the parabola through three unevenly spaced ordinates',
  single: 'a single interval between changes of spacing',
};

const equal = (a: number, b: number): boolean => Math.abs(a - b) <= EQUAL_SPACING * Math.max(Math.abs(a), Math.abs(b));

/** Weights of the interpolating polynomial through `size` abscissae, integrated over their span. */
function interpolatoryWeights(x: ArrayLike<number>, start: number, size: number): number[] {
  const a = x[start]!;
  const span = x[start + size - 1]! - a;
  const w = new Array<number>(size).fill(0);
  if (size === 2) return [span / 2, span / 2];
  if (size === 3) {
    const h1 = x[start + 1]! - a;
    const h2 = span - h1;
    return [(span * (2 * h1 - h2)) / (6 * h1), (span * span * span) / (6 * h1 * h2), (span * (2 * h2 - h1)) / (6 * h2)];
  }
  // Three-point Gauss-Legendre on [a, b] is exact to degree 5, enough for a cubic basis.
  const t = [0.5 - Math.sqrt(15) / 10, 0.5, 0.5 + Math.sqrt(15) / 10];
  const g = [5 / 18, 8 / 18, 5 / 18];
  for (let q = 0; q < 3; q++) {
    const at = a + t[q]! * span;
    for (let k = 0; k < size; k++) {
      let basis = 1;
      const xk = x[start + k]!;
      for (let m = 0; m < size; m++) if (m !== k) basis *= (at - x[start + m]!) / (xk - x[start + m]!);
      w[k]! += g[q]! * span * basis;
    }
  }
  return w;
}

/** The panel of `size` ordinates at `start`, or undefined where its rule would need a negative weight. */
function panelAt(x: ArrayLike<number>, start: number, size: 2 | 3 | 4): LengthPanel | undefined {
  const span = x[start + size - 1]! - x[start]!;
  if (size === 2) return { start, size, rule: 'single', weights: [span / 2, span / 2] };
  let even = true;
  const h0 = x[start + 1]! - x[start]!;
  for (let k = 1; k < size - 1; k++) if (!equal(x[start + k + 1]! - x[start + k]!, h0)) even = false;
  if (even) {
    const h = span / (size - 1);
    return size === 3
      ? { start, size, rule: 'first', weights: [h / 3, (4 * h) / 3, h / 3] }
      : { start, size, rule: 'second', weights: [(3 * h) / 8, (9 * h) / 8, (9 * h) / 8, (3 * h) / 8] };
  }
  const weights = interpolatoryWeights(x, start, size);
  if (weights.some((w) => !(w >= 0))) return undefined;
  return { start, size, rule: size === 4 ? 'cubic' : 'parabola', weights };
}

const COST: Readonly<Record<LengthRule, number>> = { first: 0, second: 1, cubic: 2, parabola: 3, single: 10 };

/** The cheapest cover of ordinates from..to (one part, no step inside) by panels. */
function coverPart(x: ArrayLike<number>, from: number, to: number, out: LengthPanel[]): void {
  const n = to - from; // intervals
  const best = new Float64Array(n + 1).fill(Infinity);
  const choice: (LengthPanel | undefined)[] = new Array(n + 1);
  best[n] = 0;
  for (let k = n - 1; k >= 0; k--) {
    // Pairs first, so that among equal covers the second-rule panel comes last.
    for (const size of [3, 4, 2] as const) {
      if (k + size - 1 > n) continue;
      const p = panelAt(x, from + k, size);
      if (p === undefined) continue;
      const cost = COST[p.rule] + best[k + size - 1]!;
      if (cost < best[k]!) {
        best[k] = cost;
        choice[k] = p;
      }
    }
  }
  for (let k = 0; k < n; ) {
    const p = choice[k]!;
    out.push(p);
    k += p.size - 1;
  }
}

/** Whether abscissa i stands at a step: the intervals either side of it differ by more than STEP_RATIO. */
export function isSpacingStep(x: ArrayLike<number>, i: number): boolean {
  if (i <= 0 || i >= x.length - 1) return false;
  const h1 = x[i]! - x[i - 1]!;
  const h2 = x[i + 1]! - x[i]!;
  return h2 > STEP_RATIO * h1 * (1 + EQUAL_SPACING) || h1 > STEP_RATIO * h2 * (1 + EQUAL_SPACING);
}

/**
 * The panels covering ordinates `from` .. `to` (inclusive) of strictly increasing
 * abscissae `x`. Fewer than two ordinates give no panel.
 */
export function lengthPanels(x: ArrayLike<number>, from = 0, to = x.length - 1): LengthPanel[] {
  const out: LengthPanel[] = [];
  if (to - from < 1) return out;
  let partStart = from;
  for (let k = from + 1; k < to; k++) {
    if (isSpacingStep(x, k)) {
      coverPart(x, partStart, k, out);
      partStart = k;
    }
  }
  coverPart(x, partStart, to, out);
  return out;
}

/**
 * The weights of ordinates `from` .. `to` (index k - from in the result) when the whole
 * run is integrated with `lengthPanels`, single intervals by the trapezoidal rule.
 * Every weight is positive and they sum to x[to] - x[from].
 */
export function lengthWeights(x: ArrayLike<number>, from = 0, to = x.length - 1): Float64Array {
  const w = new Float64Array(Math.max(0, to - from + 1));
  for (const p of lengthPanels(x, from, to)) p.weights.forEach((v, k) => (w[p.start - from + k]! += v));
  return w;
}
