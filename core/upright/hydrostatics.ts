/**
 * The upright hydrostatic particulars of a hull at a draft.
 *
 * Method: each station's immersed area, vertical moment, waterline half-breadth and
 * wetted girth come from its section (core/hull/section.ts); the longitudinal integrals run
 * over the immersed length only, with the ordinates and weights of core/upright/
 * waterlinePlan.ts (Simpson's rules between the stations, end pieces read from the
 * hull between stations where the waterline ends), so the results equal the
 * calculation sheet of the same plan. Definitions follow the field table of
 * the project's conventions (README, "Hydrostatic particulars"); for the formulae see
 * e.g. E. C. Tupper, Introduction to Naval Architecture, 5th ed. (Butterworth-
 * Heinemann, 2013), ch. 3 and 4.
 *
 * LWL runs from the aftmost to the foremost end of the waterline (an end between two
 * stations is where the straight keel line between them crosses it); BWL is twice the
 * greatest half-breadth among the ordinates. The midship area is that of a station at
 * amidships, or read from the parabola through the three stations nearest to it (no
 * step in the spacing between them), or from the section between two stations where
 * the parabola has no three stations to stand on.
 */
import { fail, HalfbreadthError, type Issue } from '../common/errors.js';
import { SEA_WATER_DENSITY } from '../common/constants.js';
import type { HydrostaticRow } from './hydrostaticFields.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { particularsFromIntegrals } from './particulars.js';
import { valuesBetween } from '../hull/betweenStations.js';
import { emptyValues } from '../hull/section.js';
import { isSpacingStep } from '../quadrature/lengthPanels.js';
import { coefficient } from './coefficientNotes.js';
import { forwardWettedGirth, isStationOrdinate, levelAt, ordinateValues, waterlinePlan, type WaterlinePlan } from './waterlinePlan.js';

/** Check that a draft lies within the hull; the path names it in the request. */
export function checkDraft(p: PreparedHull, draft: number, path: readonly (string | number)[] = ['draft']): void {
  if (!Number.isFinite(draft)) fail('HYD_DRAFT_LIST', path, `draft ${draft} is not a finite number`);
  if (!(draft > p.lowestKeel) || draft > p.lowestDeck) {
    fail(
      'HYD_DRAFT_OUT_OF_RANGE',
      path,
      `draft ${draft} m is outside the hull: it must lie above the lowest keel (z = ${p.lowestKeel} m) and at or below the lowest deck edge (z = ${p.lowestDeck} m)`,
    );
  }
}

/** The aft and forward ends of the waterline at `draft`, m: the outermost ends of core/upright/waterlinePlan.ts. */
export function waterlineEnds(p: PreparedHull, draft: number): { aft: number; fwd: number } {
  const { ends } = waterlinePlan(p, draft);
  if (ends.length === 0) return { aft: Number.NaN, fwd: Number.NaN };
  return { aft: Math.min(...ends.map((e) => e.x)), fwd: Math.max(...ends.map((e) => e.x)) };
}

/**
 * Immersed sectional area at amidships (see the module note): a station there, else the
 * parabola through three immersed stations around it that no step in the spacing
 * separates, else the section read between the two stations around it.
 */
export function midshipArea(p: PreparedHull, plan: WaterlinePlan, areaOf: (station: number) => number): number {
  const { x } = p;
  const xm = p.perp.xm;
  const tol = 1e-9 * Math.max(1, Math.abs(p.perp.lbp));
  for (const [a, b] of plan.runs) {
    const lo = x[a]!;
    const hi = x[b]!;
    if (xm < lo - tol || xm > hi + tol) continue;
    // The interval [x_i, x_i+1] of the run that holds amidships (bisection: x increases).
    let i = a;
    let upper = b;
    while (upper - i > 1) {
      const mid = (i + upper) >> 1;
      if (x[mid]! < xm - tol) i = mid;
      else upper = mid;
    }
    if (i + 1 <= b && x[i + 1]! < xm - tol) i++;
    if (Math.abs(x[i]! - xm) <= tol) return areaOf(i);
    if (i + 1 <= b && Math.abs(x[i + 1]! - xm) <= tol) return areaOf(i + 1);
    // Three stations: i - 1, i, i + 1 or i, i + 1, i + 2, the third the nearer to amidships
    // (the aft one on a tie, to a part in 1e9 of the length so that moving or scaling
    // the hull does not change the choice), neither across a step.
    const aftOk = i - 1 >= a && !isSpacingStep(x, i);
    const fwdOk = i + 2 <= b && !isSpacingStep(x, i + 1);
    let s = -1;
    if (aftOk && fwdOk) s = xm - x[i - 1]! <= x[i + 2]! - xm + tol ? i - 1 : i;
    else if (aftOk) s = i - 1;
    else if (fwdOk) s = i;
    if (s >= 0) {
      let sum = 0;
      for (let k = s; k < s + 3; k++) {
        let basis = 1;
        for (let m = s; m < s + 3; m++) if (m !== k) basis *= (xm - x[m]!) / (x[k]! - x[m]!);
        sum += basis * areaOf(k);
      }
      return sum;
    }
    const between = valuesBetween(p.forward[i] ?? p.sections[i]!, p.sections[i + 1]!, (xm - x[i]!) / (x[i + 1]! - x[i]!), x[i + 1]! - x[i]!, levelAt(p, plan, xm));
    return between.area;
  }
  // Amidships in an end piece, or clear of the water.
  for (let k = 0; k < plan.count; k++) {
    if (isStationOrdinate(plan, k)) continue;
    const a = plan.a[k]!;
    const b = plan.b[k]!;
    if (xm >= Math.min(x[a]!, x[b]!) && xm <= Math.max(x[a]!, x[b]!)) {
      const t = (xm - x[a]!) / (x[b]! - x[a]!);
      return valuesBetween(p.sections[a]!, p.sections[b]!, t, x[b]! - x[a]!, levelAt(p, plan, xm)).area;
    }
  }
  return 0;
}

/** Hydrostatic particulars at one draft (m), density in t/m³. */
export function hydrostaticsAt(p: PreparedHull, draft: number, density = SEA_WATER_DENSITY): HydrostaticRow {
  checkDraft(p, draft);
  return rowOfPlan(p, waterlinePlan(p, draft), density);
}

/**
 * The particulars of a level or trimmed waterline's plan (a trimmed waterline is level
 * across, rising aft by plan.tanTrim; core/stability/trimmedHydrostatics.ts): every
 * section cut level at the waterline's height at its own x, the plan's weights along the
 * length. `draft` in the row is the height at amidships, and the coefficients take it.
 */
export function rowOfPlan(p: PreparedHull, plan: WaterlinePlan, density: number): HydrostaticRow {
  const draft = plan.draft;
  const xm = p.perp.xm;
  const n = p.x.length;
  const v = emptyValues();
  const areas = new Array<number>(n).fill(Number.NaN);
  let vol = 0;
  let momX = 0;
  let momZ = 0;
  let aw = 0;
  let awX = 0;
  let awXX = 0;
  let iT = 0;
  let ws = 0;
  let yMax = 0;
  const { weight, weightForward, a: at } = plan;
  const { sections, forward } = p;
  for (let k = 0; k < plan.count; k++) {
    const station = isStationOrdinate(plan, k);
    // A station's own section directly: the common case, kept out of the general reader.
    if (station) sections[at[k]!]!.evaluate(plan.tanTrim === 0 ? draft : levelAt(p, plan, plan.x[k]!), v);
    else ordinateValues(p, plan, k, v);
    const w = weight[k]!;
    const dx = plan.x[k]! - xm; // moments about amidships keep the sums well conditioned
    const y = v.halfBreadth;
    vol += w * v.area;
    momX += w * v.area * dx;
    momZ += w * v.momentZ;
    aw += w * y;
    awX += w * y * dx;
    awXX += w * y * dx * dx;
    iT += w * y * y * y;
    if (y > yMax) yMax = y;
    if (station) {
      const i = at[k]!;
      areas[i] = v.area;
      const wf = forward[i] === undefined ? 0 : weightForward[k]!;
      ws += (w - wf) * v.wettedGirth;
      if (wf > 0) ws += wf * forwardWettedGirth(p, plan, k, v);
    } else ws += w * v.wettedGirth;
  }
  // Immersed end faces (a transom, a square bow) are part of the wetted surface.
  ws += (Number.isNaN(areas[0]!) ? 0 : areas[0]!) + (Number.isNaN(areas[n - 1]!) ? 0 : areas[n - 1]!);
  const particulars = particularsFromIntegrals(
    { volume: vol, momentX: momX, momentZ: momZ, waterplaneArea: 2 * aw, waterplaneMomentX: 2 * awX, waterplaneSecondMomentX: 2 * awXX, iT: (2 / 3) * iT },
    xm,
    p.perp.lbp,
    density,
  );
  let aftmost = Infinity;
  let foremost = -Infinity;
  for (const e of plan.ends) {
    if (e.x < aftmost) aftmost = e.x;
    if (e.x > foremost) foremost = e.x;
  }
  const lwl = foremost - aftmost;
  const bwl = 2 * yMax;
  const am = midshipArea(p, plan, (i) => (Number.isNaN(areas[i]!) ? p.sections[i]!.evaluate(levelAt(p, plan, p.x[i]!)).area : areas[i]!));
  const ratio = coefficient;
  return {
    draft,
    ...particulars,
    lwl,
    bwl,
    am,
    cb: ratio(vol, lwl * bwl * draft),
    cm: ratio(am, bwl * draft),
    cp: ratio(vol, am * lwl),
    cwp: ratio(particulars.waterplaneArea, lwl * bwl),
    wettedSurface: ws,
  };
}

/**
 * The hydrostatic table at a list of drafts. Every draft is checked first, so bad ones
 * fail the whole request together, each with its index named, and nothing is half-computed.
 */
export function hydrostaticTable(p: PreparedHull, drafts: readonly number[], density = SEA_WATER_DENSITY): HydrostaticRow[] {
  const issues: Issue[] = [];
  drafts.forEach((d, k) => {
    try {
      checkDraft(p, d, ['drafts', k]);
    } catch (e) {
      if (e instanceof HalfbreadthError) issues.push(...e.issues);
      else throw e;
    }
  });
  if (issues.length > 0) throw new HalfbreadthError(issues);
  return drafts.map((d) => hydrostaticsAt(p, d, density));
}
