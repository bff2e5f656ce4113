/**
 * The floating position for a load: the draft at the perpendiculars, the trim and the heel
 * at which the hull floats a displacement with its centre of gravity at (LCG, TCG, KG).
 *
 * Balance: the immersed volume is Δ / ρ, and the centre of buoyancy B lies on the vertical
 * through the centre of gravity G, that is (B - G) × n = 0 with n the waterplane's upward
 * normal (core/stability/inclinedHydrostatics.ts). Two components of that product and
 * the volume are three equations in the waterplane's h, trim angle τ and heel φ; they are
 * solved by Newton's method with the Jacobian by differences, each step's volume met
 * exactly first (core/stability/solveVolume.ts). With the centre of gravity on the
 * centreline (TCG 0) a hull symmetric about it floats upright, and only h and τ are
 * sought. Without a KG the vertical through G is taken to pass through B's height, so the
 * balance along the length is LCB = LCG in the hull's frame, the usual way of trimming a
 * hull by its hydrostatics (common practice, no source); a TCG heels the hull by an
 * amount that depends on KG, so a TCG needs one.
 *
 * Only a balance is an answer. Where G lies beyond the reach of the centre of buoyancy
 * within the hull's deck and ends (an LCG near or past an end: a trimmed box's B stays at
 * least a third of its length from either end), or G is so high and off the centreline
 * that the hull would lie on its side, the iteration ends without one; that is
 * HYD_LOAD_OUT_OF_RANGE naming the load and how far from a balance it stayed, never a
 * position that does not float the load.
 *
 * Reference: E. C. Tupper, Introduction to Naval Architecture, 5th ed. (2013), ch. 4
 * (trim and list; from memory).
 */
import { fail } from '../common/errors.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { draftAtX, type InclinedValues, type Waterplane } from './inclinedHydrostatics.js';
import { checkVolume, floatAt } from './solveVolume.js';
import { levelDraftFor } from './levelDrafts.js';
import { checkDeckEdges, type DeckEdges } from './stabilityInput.js';

export interface Load {
  /** t */
  readonly displacement: number;
  /** x of the centre of gravity, m. */
  readonly lcg: number;
  /** y of the centre of gravity, m (starboard positive); 0 by default. */
  readonly tcg?: number;
  /** Height of the centre of gravity above the baseline, m; needed with a TCG. */
  readonly kg?: number;
}

export interface FloatingPosition {
  readonly displacement: number;
  readonly lcg: number;
  readonly tcg: number;
  readonly kg: number | null;
  readonly draftAft: number;
  readonly draftFwd: number;
  /** draftAft - draftFwd, m (positive by the stern). */
  readonly trim: number;
  /** Degrees, starboard down positive. */
  readonly heel: number;
  /** Draft at amidships, m. */
  readonly draft: number;
  /** The centre of buoyancy at the solution, m. */
  readonly lcb: number;
  readonly tcb: number;
  readonly vcb: number;
  /** What is left of the balance: volume (m³) and the horizontal distances between the verticals through B and G along and across the waterplane (m). */
  readonly residuals: { readonly volume: number; readonly longitudinal: number; readonly transverse: number };
  /**
   * The metacentric height at the balance, m: the slope dGZ/dφ of the righting lever
   * there (per radian), GM0 = KMt - KG when the hull floats upright. Null without a KG.
   */
  readonly gm: number | null;
  /** Whether the balance is stable to a small heel (gm > 0): false where the vessel would not rest but loll or capsize. Null without a KG. */
  readonly stable: boolean | null;
}

/**
 * Heel of the difference for the slope of GZ at the balance, rad. Small enough that the
 * curve is straight over it (GZ's curvature there moves the slope by about 1e-6 of GM),
 * large enough that the volume solves' 1e-10 tolerance does not show.
 */
const SLOPE_STEP = 1e-4;

/** The horizontal offsets of B from G's vertical, along e1 (length) and e2 (across) of the waterplane. */
function offsets(v: InclinedValues, w: Waterplane, g: { x: number; y: number; z: number }): [number, number] {
  const sin = Math.sin(w.heel);
  const cos = Math.cos(w.heel);
  const sinT = Math.sin(w.trimAngle);
  const cosT = Math.cos(w.trimAngle);
  const bx = v.xB - g.x;
  const by = v.yB - g.y;
  const bz = v.zB - g.z;
  // e1 = (cos τ, sin φ sin τ, -cos φ sin τ), e2 = (0, cos φ, sin φ): B - G has no part
  // along either when it lies along n.
  return [bx * cosT + by * sin * sinT - bz * cos * sinT, by * cos + bz * sin];
}

/**
 * A balance found is met to 1e-9 of the length (the iteration's target); one that is not
 * met to a thousand times that is no balance at all: the iteration ran out of steps.
 */
const BALANCE_SLACK = 1e-6;

const brief = (v: number): string => String(Number(v.toPrecision(4)));

/**
 * HYD_LOAD_OUT_OF_RANGE when the iteration ended away from a balance (volume, B from G's
 * vertical along or across), or with the hull heeled to 90 degrees or more, where it has no
 * drafts at its perpendiculars. Named at the TCG when the hull would not come upright enough, else at the LCG.
 */
function refuseUnbalanced(load: Load, volume: number, volumeOff: number, along: number, across: number, heel: number, drafts: readonly number[], lbp: number): void {
  const heeledOver = !(Math.abs(heel) < Math.PI / 2) || !drafts.every(Number.isFinite);
  const acrossOff = !(Math.abs(across) <= BALANCE_SLACK * lbp);
  const alongOff = !(Math.abs(along) <= BALANCE_SLACK * lbp) || !(Math.abs(volumeOff) <= BALANCE_SLACK * volume);
  if (!heeledOver && !acrossOff && !alongOff) return;
  const g = `G at x = ${load.lcg} m${load.tcg !== undefined && load.tcg !== 0 ? `, y = ${load.tcg} m` : ''}${load.kg === undefined ? '' : `, KG ${load.kg} m`}`;
  const why = heeledOver
    ? Number.isFinite(heel)
      ? `the hull heels to ${brief((heel * 180) / Math.PI)} degrees, where it has no drafts at its perpendiculars`
      : 'no heel balances it'
    : acrossOff
      ? `B stays ${brief(Math.abs(across))} m from G's vertical across the waterplane`
      : `B stays ${brief(Math.abs(along))} m from G's vertical along the length, the volume ${brief(volumeOff)} m3 from the load's`;
  fail(
    'HYD_LOAD_OUT_OF_RANGE',
    [heeledOver || acrossOff ? 'tcg' : 'lcg'],
    `no floating position balances the load (displacement ${load.displacement} t, ${g}): ${why}; the hull's centre of buoyancy cannot come under G within its deck and ends (it would trim past them or capsize)`,
  );
}

/** The floating position of `load` in water of `density` (t/m³); `deck` says which deck edges the offsets leave unsaid, which a heeling TCG needs. */
export function floatingPosition(p: PreparedHull, load: Load, density: number, deck: DeckEdges = { assumedAt: [] }): FloatingPosition {
  const volume = checkVolume(p, load.displacement, density, ['displacement']);
  const tcg = load.tcg ?? 0;
  if (tcg !== 0 && load.kg === undefined) {
    fail('HYD_BAD_ARGUMENT', ['kg'], `a TCG of ${tcg} m heels the hull by an amount that depends on the height of G: give KG as well`);
  }
  if (tcg !== 0) checkDeckEdges(p, [tcg], deck);
  const lbp = p.perp.lbp;
  // Start level at the draft that floats the volume.
  const d0 = levelDraftFor(p, volume);
  let state = { h: d0, tau: 0, phi: 0 };
  let fl = floatAt(p, volume, 0, 0, d0);
  const gOf = (v: InclinedValues): { x: number; y: number; z: number } => ({ x: load.lcg, y: tcg, z: load.kg ?? v.zB });
  const heeling = tcg !== 0;
  const solveAt = (tau: number, phi: number, hStart: number) => floatAt(p, volume, phi, tau, hStart);
  const tol = 1e-9 * lbp;
  for (let it = 0; it < 50; it++) {
    const [r1, r2] = offsets(fl.values, fl.plane, gOf(fl.values));
    if (Math.abs(r1) <= tol && (!heeling || Math.abs(r2) <= tol)) break;
    // Jacobian of the offsets in (τ, φ), by forward differences with the volume kept.
    const dTau = 1e-6;
    const aT = solveAt(state.tau + dTau, state.phi, fl.plane.h);
    const [t1, t2] = offsets(aT.values, aT.plane, gOf(aT.values));
    let stepTau: number;
    let stepPhi = 0;
    if (!heeling) {
      const d = (t1 - r1) / dTau;
      stepTau = d !== 0 ? -r1 / d : 0;
    } else {
      const dPhi = 1e-6;
      const aP = solveAt(state.tau, state.phi + dPhi, fl.plane.h);
      const [p1, p2] = offsets(aP.values, aP.plane, gOf(aP.values));
      const j11 = (t1 - r1) / dTau;
      const j21 = (t2 - r2) / dTau;
      const j12 = (p1 - r1) / dPhi;
      const j22 = (p2 - r2) / dPhi;
      const det = j11 * j22 - j12 * j21;
      if (det === 0) break;
      stepTau = (-r1 * j22 + r2 * j12) / det;
      stepPhi = (-j11 * r2 + j21 * r1) / det;
    }
    // Keep steps within reason: a trim angle under 30 degrees, a heel change under 20.
    stepTau = Math.max(-0.5, Math.min(0.5, stepTau));
    stepPhi = Math.max(-0.35, Math.min(0.35, stepPhi));
    state = { h: fl.plane.h, tau: state.tau + stepTau, phi: state.phi + stepPhi };
    fl = solveAt(state.tau, state.phi, state.h);
  }
  const [r1, r2] = offsets(fl.values, fl.plane, gOf(fl.values));
  const w = fl.plane;
  const draftAft = draftAtX(w, p.perp.ap);
  const draftFwd = draftAtX(w, p.perp.fp);
  refuseUnbalanced(load, volume, fl.values.volume - volume, r1, heeling ? r2 : 0, w.heel, [draftAft, draftFwd], lbp);
  // The balance's stability to a small heel: the across offset of B from G's vertical is
  // GZ (with the TCG), so its slope in the heel is the metacentric height at the balance
  // (central difference, the trim held: it moves GZ only at second order).
  let gm: number | null = null;
  if (load.kg !== undefined) {
    const across = (phi: number): number => {
      const a = solveAt(w.trimAngle, phi, w.h);
      return offsets(a.values, a.plane, gOf(a.values))[1];
    };
    gm = (across(w.heel + SLOPE_STEP) - across(w.heel - SLOPE_STEP)) / (2 * SLOPE_STEP);
  }
  return {
    displacement: load.displacement,
    lcg: load.lcg,
    tcg,
    kg: load.kg ?? null,
    draftAft,
    draftFwd,
    trim: draftAft - draftFwd,
    heel: (w.heel * 180) / Math.PI,
    draft: draftAtX(w, p.perp.xm),
    lcb: fl.values.xB,
    // Upright, the two sides' moments cancel to rounding (1e-17 m): say 0, as the symmetry does.
    tcb: w.heel === 0 && Math.abs(fl.values.yB) <= 1e-12 * lbp ? 0 : fl.values.yB,
    vcb: fl.values.zB,
    residuals: { volume: fl.values.volume - volume, longitudinal: r1, transverse: r2 },
    gm,
    stable: gm === null ? null : gm > 0,
  };
}
