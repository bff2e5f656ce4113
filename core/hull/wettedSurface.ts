/**
 * Slope factors for the wetted surface.
 *
 * Method: the wetted area is the integral along the length of the wetted girth, each
 * element of girth ds weighted by sqrt(1 + (dy/dx · dz/ds)^2), where dy/dx is the rate
 * at which the half-breadth at that height changes along the length (from the
 * neighbouring stations) and dz/ds the sine of the section's slope there. For a surface
 * y = Y(x, z) this is exactly the surface element sqrt(1 + Y_x^2 + Y_z^2) dx dz written
 * per unit girth, so a hull whose waterlines run parallel to the centreline gets factor
 * 1 and the girth method, and a fine bow gets its oblique area. The flat of bottom
 * gets sqrt(1 + (dzKeel/dx)^2) for the rise of the keel.
 *
 * Corners (the keel, knuckles, the deck edge) are not points of a smooth y = Y(x, z):
 * at a chine the surface has two slopes, and the stations on either side meet the
 * chine's height on different faces. There each face gets its own factor from the
 * corner line itself: with (y', z') the rate at which the corner moves along x (the
 * same corner of the neighbouring stations) and (ty, tz) the face's unit tangent, the
 * surface element per unit girth is sqrt(1 + (y' tz - z' ty)^2), the same formula with
 * the motion taken along the line instead of at constant height (|r_x × r_s| for
 * r(x, s) on the surface). Corners are matched by order when the neighbouring
 * stations have as many (a flat of bottom counting as a corner at the centreline
 * whether drawn out as points or closed by the section); otherwise the constant-height
 * slope is used.
 * Derivation: common practice,
 * no source; the surface element is from any calculus text (e.g. E. Kreyszig, Advanced
 * Engineering Mathematics, 10th ed., Wiley 2011, sec. 10.6).
 */
import { derivative3 } from '../quadrature/derivative.js';
import type { Section } from './section.js';

/**
 * Set the slope factors of every section. `forward[i]`, where given, is a second copy of
 * station i's section for the panels forward of it: station i then stands at a step in
 * the station spacing (core/quadrature/lengthPanels.ts), and no derivative is taken
 * across a step, just as no Simpson panel straddles one. `sections[i]` gets the factors
 * from the station and those aft of it, `forward[i]` those from the station and those
 * forward of it; a profile that turns at the step (a flat keel meeting a raked stem at a
 * closer-spaced station) keeps each side's own slope.
 */
export function applyWettedFactors(x: Float64Array, sections: readonly Section[], forward: readonly (Section | undefined)[] = []): void {
  const n = sections.length;
  for (let i = 0; i < n; i++) {
    const fwd = forward[i];
    if (fwd === undefined) setFactors(x, sections, i, sections[i]!, true, true);
    else {
      setFactors(x, sections, i, sections[i]!, true, false);
      setFactors(x, sections, i, fwd, false, true);
    }
  }
}

/** The factors of station i's section `sec`, from its neighbours aft (`useAft`) and forward (`useFwd`). */
function setFactors(x: Float64Array, sections: readonly Section[], i: number, sec: Section, useAft: boolean, useFwd: boolean): void {
  const n = sections.length;
  const prev = useAft ? sections[i - 1] : undefined;
  const next = useFwd ? sections[i + 1] : undefined;
  const xa = i > 0 ? x[i - 1]! : Number.NaN;
  const xb = i < n - 1 ? x[i + 1]! : Number.NaN;
  const ys = sec.pointsY();
  const zs = sec.pointsZ();
  const tan = sec.pointTangents();
  const zx = derivative3(xa, prev?.zKeel ?? Number.NaN, x[i]!, sec.zKeel, xb, next?.zKeel ?? Number.NaN);
  const keelFactor = Math.sqrt(1 + zx * zx);
  const factors = new Float64Array(ys.length);
  const factorsBelow = new Float64Array(ys.length);
  for (let k = 0; k < ys.length; k++) {
    const z = zs[k]!;
    const ya = prev?.halfBreadthAt(z) ?? Number.NaN;
    const yb = next?.halfBreadthAt(z) ?? Number.NaN;
    const yx = derivative3(xa, ya, x[i]!, ys[k]!, xb, yb);
    const c = yx * tan.z[k]!;
    factors[k] = Math.sqrt(1 + c * c);
    factorsBelow[k] = factors[k]!;
  }
  // Corners: the motion of the corner line, on each face (see the module note).
  const own = cornerPoints(sec);
  for (let j = 0; j < own.length; j++) {
    const k = own[j]!;
    if (k < 0) continue; // the centreline end of a flat of bottom closed by the section itself
    const a = prev === undefined ? undefined : matchingCorner(prev, j, own.length);
    const b = next === undefined ? undefined : matchingCorner(next, j, own.length);
    if (a !== undefined || b !== undefined) {
      const dy = derivative3(xa, a?.y ?? Number.NaN, x[i]!, ys[k]!, xb, b?.y ?? Number.NaN);
      const dz = derivative3(xa, a?.z ?? Number.NaN, x[i]!, zs[k]!, xb, b?.z ?? Number.NaN);
      const above = dy * tan.z[k]! - dz * tan.y[k]!;
      const below = dy * tan.zBelow[k]! - dz * tan.yBelow[k]!;
      factors[k] = Math.sqrt(1 + above * above);
      factorsBelow[k] = Math.sqrt(1 + below * below);
    }
    // A level face at the keel's height is a flat of bottom drawn out as points: it
    // rises with the keel, as the flat that the section closes itself does.
    if (zs[k] === sec.zKeel) {
      if (tan.z[k] === 0) factors[k] = keelFactor;
      if (tan.zBelow[k] === 0) factorsBelow[k] = keelFactor;
    }
  }
  sec.setWettedFactors(factors, factorsBelow);
  sec.bottomFactor = keelFactor;
}

/**
 * The corners of a section in order, as point indices, with -1 first where the
 * section's lowest half-breadth is above zero: the centreline end of the flat of bottom
 * that the section closes itself. So a flat given as points and a flat left to the
 * closure count alike.
 */
function cornerPoints(sec: Section): number[] {
  const corners = Array.from(sec.cornerIndices());
  return sec.yKeel > 0 ? [-1, ...corners] : corners;
}

/**
 * Where corner j of `count` lies on a neighbouring section, or undefined. Corners match
 * by order only when the neighbour has as many: where a knuckle dies out (a flat of
 * bottom narrowing to nothing at the stem) even the keel of one station is not the
 * keel line of the next.
 */
function matchingCorner(other: Section, j: number, count: number): { y: number; z: number } | undefined {
  const theirs = cornerPoints(other);
  if (theirs.length !== count) return undefined;
  const k = theirs[j]!;
  return k < 0 ? { y: 0, z: other.zKeel } : { y: other.pointsY()[k]!, z: other.pointsZ()[k]! };
}
