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
 * gets sqrt(1 + (dzKeel/dx)^2) for the rise of the keel. Derivation: common practice,
 * no source; the surface element is from any calculus text (e.g. E. Kreyszig, Advanced
 * Engineering Mathematics, 10th ed., Wiley 2011, sec. 10.6).
 */
import { derivative3 } from './derivative.js';
import type { Section } from './section.js';

export function applyWettedFactors(x: Float64Array, sections: readonly Section[]): void {
  const n = sections.length;
  for (let i = 0; i < n; i++) {
    const sec = sections[i]!;
    const prev = sections[i - 1];
    const next = sections[i + 1];
    const xa = i > 0 ? x[i - 1]! : Number.NaN;
    const xb = i < n - 1 ? x[i + 1]! : Number.NaN;
    const ys = sec.pointsY();
    const zs = sec.pointsZ();
    const slopes = sec.pointSlopes();
    const factors = new Float64Array(ys.length);
    for (let k = 0; k < ys.length; k++) {
      const z = zs[k]!;
      const ya = prev?.halfBreadthAt(z) ?? Number.NaN;
      const yb = next?.halfBreadthAt(z) ?? Number.NaN;
      const yx = derivative3(xa, ya, x[i]!, ys[k]!, xb, yb);
      const c = yx * slopes[k]!;
      factors[k] = Math.sqrt(1 + c * c);
    }
    sec.setWettedFactors(factors);
    const zx = derivative3(xa, prev?.zKeel ?? Number.NaN, x[i]!, sec.zKeel, xb, next?.zKeel ?? Number.NaN);
    sec.bottomFactor = Math.sqrt(1 + zx * zx);
  }
}
