/**
 * The hull heeled to a given angle with a given volume, at level trim or free to trim.
 *
 * Level trim: the trim angle stays 0 and only the waterplane's offset h is found
 * (core/stability/solveVolume.ts). Free trim: the hull trims until its centre of buoyancy
 * lies at a given x (the upright LCB of the displacement, so that a centre of gravity
 * above it stays above it as the hull heels), which is Newton's iteration on the trim
 * angle, the volume met at every step and the derivative taken by a difference. Each
 * heel of a sweep starts from the last one's waterplane, so a sweep in small steps
 * costs two or three evaluations a heel.
 */
import type { PreparedHull } from '../hull/preparedHull.js';
import { floatAt, type Floated } from './solveVolume.js';

export interface HeelState {
  readonly h: number;
  readonly trimAngle: number;
}

/**
 * KN of a floated hull at heel φ (rad), m: yB cos φ + zB sin φ (the project's conventions).
 * Upright, the two sides' moments cancel to rounding (1e-17 m); that is said as 0, as the
 * symmetry has it.
 */
export function knOf(p: PreparedHull, fl: Floated, phi: number): number {
  const kn = fl.values.yB * Math.cos(phi) + fl.values.zB * Math.sin(phi);
  return phi === 0 && Math.abs(kn) <= 1e-12 * p.perp.lbp ? 0 : kn;
}

/**
 * The hull at heel `heel` (rad) floating `volume` (m³). With `lcb` given it is free to
 * trim until its centre of buoyancy lies at x = lcb; else level. `start` is a nearby
 * solution (the previous heel's).
 */
export function heeledFloat(p: PreparedHull, volume: number, heel: number, lcb: number | undefined, start?: HeelState): Floated {
  let tau = lcb === undefined ? 0 : (start?.trimAngle ?? 0);
  let fl = floatAt(p, volume, heel, tau, start?.h);
  if (lcb === undefined) return fl;
  const tol = 1e-9 * Math.abs(p.perp.lbp);
  for (let it = 0; it < 40; it++) {
    const r = fl.values.xB - lcb;
    if (Math.abs(r) <= tol) break;
    const dTau = 1e-6;
    const probe = floatAt(p, volume, heel, tau + dTau, fl.plane.h);
    const slope = (probe.values.xB - fl.values.xB) / dTau;
    if (!(slope !== 0) || !Number.isFinite(slope)) break;
    // Steps kept under about 15 degrees of trim at a time.
    const step = Math.max(-0.25, Math.min(0.25, -r / slope));
    tau += step;
    fl = floatAt(p, volume, heel, tau, fl.plane.h);
  }
  return fl;
}

/**
 * The solutions of a sweep over heels, to start each heel's iteration from: the
 * straight line through the last two (h and trim angle against heel), or the last one.
 */
export class HeelSweep {
  private readonly heels: number[] = [];
  private readonly states: HeelState[] = [];

  add(heel: number, state: HeelState): void {
    this.heels.push(heel);
    this.states.push({ h: state.h, trimAngle: state.trimAngle });
    if (this.heels.length > 2) {
      this.heels.shift();
      this.states.shift();
    }
  }

  guess(heel: number): HeelState | undefined {
    const n = this.heels.length;
    if (n === 0) return undefined;
    const b = this.states[n - 1]!;
    if (n === 1) return b;
    const a = this.states[0]!;
    const span = this.heels[1]! - this.heels[0]!;
    if (span === 0) return b;
    const f = (heel - this.heels[1]!) / span;
    return { h: b.h + f * (b.h - a.h), trimAngle: b.trimAngle + f * (b.trimAngle - a.trimAngle) };
  }
}
