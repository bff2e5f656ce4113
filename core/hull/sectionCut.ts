/**
 * A whole section cut by a waterline at any heel: the area below the line, its moments,
 * and the line's chord across the section (the waterplane's breadth at this station).
 *
 * The waterline in the section's plane is the set of points with -y sin φ + z cos φ = h,
 * φ the heel (starboard down positive) and h the line's distance from the baseline's
 * centre point K along the upward normal n = (-sin φ, cos φ); below the water means
 * -y sin φ + z cos φ < h. This form holds at any heel, 90 degrees and beyond included.
 *
 * Method (Green's theorem over the closed boundary of core/hull/sectionBoundary.ts, run
 * anticlockwise): for the region R below the line,
 *   area = ∮ y dz,  ∫∫ y dA = ∮ y²/2 dz,  ∫∫ z dA = ∮ y z dz,
 * the integrals taken along the parts of the boundary below the line and along the
 * line's chords inside the section, each chord run from its starboard-up end to the
 * other so that R lies on its left. On a fitted piece the line is crossed where a cubic
 * in the piece's parameter vanishes: its roots are found exactly (monotone stretches
 * between the cubic's turning points, bisected), and the part below is integrated by
 * five-point Gauss-Legendre quadrature, exact for these polynomial integrands. So deck
 * immersion (the line crossing the deck) and bilge emergence (crossing a side twice)
 * are taken exactly on the fitted section, whatever the heel. The chords are where the
 * line crosses the boundary, paired in order along the line (a closed curve is entered
 * and left in turn); a part of the boundary that lies on the line itself (a flat of bottom
 * or deck exactly at the waterline) adds nothing below it, and is counted in the chord.
 *
 * At zero heel this is the level waterline of core/hull/section.ts: the same pieces, the
 * same crossing, the same quadrature (both sides at once instead of one side doubled).
 * Reference for the moments by boundary integrals: any text on Green's theorem, e.g.
 * E. Kreyszig, Advanced Engineering Mathematics, 10th ed. (Wiley, 2011), sec. 10.4.
 */
import { cubicAt, segmentIntegrals, type SectionBoundary } from './sectionBoundary.js';

export interface CutValues {
  /** Area of the section below the waterline, m². */
  area: number;
  /** ∫∫ y dA over it, m³ (y to starboard). */
  momentY: number;
  /** ∫∫ z dA over it, m³ (z up from the baseline). */
  momentZ: number;
  /** Length of the waterline's chords across the section, m (its breadth there). */
  chord: number;
  /** ∫ s ds and ∫ s² ds over the chords, s measured along the line from the foot of K on it, positive towards starboard-up; m² and m³. */
  chordS: number;
  chordS2: number;
  /** How many separate chords (0 when the line misses the section or passes wholly above it). */
  chords: number;
  /** The chords' lowest and highest s, m (NaN without a chord). */
  chordFrom: number;
  chordTo: number;
}

export function emptyCut(): CutValues {
  return { area: 0, momentY: 0, momentZ: 0, chord: 0, chordS: 0, chordS2: 0, chords: 0, chordFrom: Number.NaN, chordTo: Number.NaN };
}

const BELOW = 0;
const ABOVE = 1;
const ON = 2;

/**
 * Where the cubic c[o..] (in u) changes sign on the stretch [lo, hi], where it is
 * monotone: the root, or NaN. Newton's iteration kept inside the bracket (a bisection
 * where a step would leave it): a few steps to the last bits on a monotone cubic.
 */
function rootIn(c: Float64Array, o: number, lo: number, hi: number, s: number): number {
  let flo = cubicAt(c, o, lo);
  const fhi = cubicAt(c, o, hi);
  if (flo === 0 || fhi === 0 || flo < 0 === fhi < 0) return Number.NaN;
  const c1 = c[o + 1]!;
  const c2 = c[o + 2]!;
  const c3 = c[o + 3]!;
  // Start where the chord crosses: a good guess on a gently curved stretch.
  let u = lo - (flo * (hi - lo)) / (fhi - flo);
  for (let it = 0; it < 100; it++) {
    const f = cubicAt(c, o, u);
    if (f === 0) return u;
    if (f < 0 === flo < 0) {
      lo = u;
      flo = f;
    } else hi = u;
    const d = c1 + u * (2 * c2 + u * 3 * c3);
    let next = d !== 0 ? u - f / d : Number.NaN;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - u) <= 1e-15 * (1 + s) || hi - lo <= 1e-15 * (1 + s)) return next;
    u = next;
  }
  return u;
}

/** Roots in (0, s) where the cubic c[o..] (in u) changes sign, ascending, into `out`. */
function signChangesIn(c: Float64Array, o: number, s: number, out: number[]): void {
  out.length = 0;
  // Turning points split [0, s] into stretches where the cubic is monotone.
  const a = c[o + 1]!;
  const b = 2 * c[o + 2]!;
  const q = 3 * c[o + 3]!;
  let t1 = Number.NaN;
  let t2 = Number.NaN;
  if (q === 0) {
    if (b !== 0) t1 = -a / b;
  } else {
    const disc = b * b - 4 * a * q;
    if (disc > 0) {
      const r = -0.5 * (b + Math.sign(b || 1) * Math.sqrt(disc));
      const u1 = r / q;
      const u2 = r !== 0 ? a / r : u1;
      t1 = Math.min(u1, u2);
      t2 = Math.max(u1, u2);
    }
  }
  let from = 0;
  for (let k = 0; k < 3; k++) {
    const cut = k === 0 ? t1 : k === 1 ? t2 : s;
    if (!(cut > from && cut <= s)) continue;
    const r = rootIn(c, o, from, cut, s);
    if (!Number.isNaN(r)) out.push(r);
    from = cut;
  }
}

/** Scratch arrays, reused (no allocation in the loop of a table). */
const roots: number[] = [];
const crossings: number[] = [];
const onFrom: number[] = [];
const onTo: number[] = [];
const part = new Float64Array(3);
const fc = new Float64Array(4);

/**
 * Cut the section whose boundary is `bd` by the waterline -y sin φ + z cos φ = h, given
 * as `sin` = sin φ, `cos` = cos φ and `h`; the values are written into `out`.
 */
export function cutSection(bd: SectionBoundary, sin: number, cos: number, h: number, out: CutValues = emptyCut()): CutValues {
  const tolOn = 1e-12 * (bd.scale + Math.abs(h));
  let area = 0;
  let my = 0;
  let mz = 0;
  crossings.length = 0;
  onFrom.length = 0;
  onTo.length = 0;
  let firstClass = -1;
  let prevClass = -1;
  const { cy, cz, span, yMin, yMax, zMin, zMax } = bd;
  const count = bd.count;
  for (let k = 0; k < count; k++) {
    const o = 4 * k;
    // The line's function f = -y sin + z cos - h along the segment, bounded by its box.
    const a1 = -yMin[k]! * sin;
    const a2 = -yMax[k]! * sin;
    const b1 = zMin[k]! * cos;
    const b2 = zMax[k]! * cos;
    const fMax = (a1 > a2 ? a1 : a2) + (b1 > b2 ? b1 : b2) - h;
    if (fMax < -tolOn) {
      // Wholly below: the integrals of the whole segment, worked once. A change of class
      // (between below and not below) at the segment's start is a crossing.
      if (prevClass > BELOW) crossings.push(cy[o]! * cos + cz[o]! * sin);
      if (firstClass < 0) firstClass = BELOW;
      prevClass = BELOW;
      area += bd.fullArea[k]!;
      my += bd.fullMy[k]!;
      mz += bd.fullMz[k]!;
      continue;
    }
    const fMin = (a1 < a2 ? a1 : a2) + (b1 < b2 ? b1 : b2) - h;
    if (fMin > tolOn) {
      if (prevClass === BELOW) crossings.push(cy[o]! * cos + cz[o]! * sin);
      if (firstClass < 0) firstClass = ABOVE;
      prevClass = ABOVE;
      continue;
    }
    const s = span[k]!;
    for (let j = 0; j < 4; j++) fc[j] = -cy[o + j]! * sin + cz[o + j]! * cos;
    fc[0]! -= h;
    signChangesIn(fc, 0, s, roots);
    let u0 = 0;
    for (let r = 0; r <= roots.length; r++) {
      const u1 = r < roots.length ? roots[r]! : s;
      if (!(u1 > u0)) continue;
      const fm = cubicAt(fc, 0, 0.5 * (u0 + u1));
      let cls: number;
      if (fm < -tolOn) cls = BELOW;
      else if (fm > tolOn) cls = ABOVE;
      else {
        // On the line only if it stays there (a flat at the waterline), not a touch.
        const d = u1 - u0;
        const on =
          Math.abs(cubicAt(fc, 0, u0)) <= tolOn &&
          Math.abs(cubicAt(fc, 0, u0 + 0.25 * d)) <= tolOn &&
          Math.abs(cubicAt(fc, 0, u0 + 0.75 * d)) <= tolOn &&
          Math.abs(cubicAt(fc, 0, u1)) <= tolOn;
        cls = on ? ON : fm < 0 ? BELOW : ABOVE;
      }
      const y0 = cubicAt(cy, o, u0);
      const z0 = cubicAt(cz, o, u0);
      if (prevClass >= 0 && (prevClass === BELOW) !== (cls === BELOW)) crossings.push(y0 * cos + z0 * sin);
      if (firstClass < 0) firstClass = cls;
      prevClass = cls;
      if (cls === BELOW) {
        segmentIntegrals(bd, k, u0, u1, part);
        area += part[0]!;
        my += part[1]!;
        mz += part[2]!;
      } else if (cls === ON) {
        const sa = y0 * cos + z0 * sin;
        const sb = cubicAt(cy, o, u1) * cos + cubicAt(cz, o, u1) * sin;
        onFrom.push(Math.min(sa, sb));
        onTo.push(Math.max(sa, sb));
      }
      u0 = u1;
    }
  }
  // Closing the loop: the boundary's start, after its end.
  if (firstClass >= 0 && prevClass >= 0 && (prevClass === BELOW) !== (firstClass === BELOW)) crossings.push(cy[0]! * cos + cz[0]! * sin);

  // The chords: crossings paired in order along the line.
  if (crossings.length > 2) crossings.sort((p, q) => p - q);
  else if (crossings.length === 2 && crossings[0]! > crossings[1]!) {
    const t = crossings[0]!;
    crossings[0] = crossings[1]!;
    crossings[1] = t;
  }
  // A point at a distance s along the line: h n + s t, n = (-sin, cos), t = (cos, sin).
  const py = (sv: number): number => -h * sin + sv * cos;
  const pz = (sv: number): number => h * cos + sv * sin;
  for (let k = 0; k + 1 < crossings.length; k += 2) {
    const lo = crossings[k]!;
    const hi = crossings[k + 1]!;
    // From the high end to the low: the region below lies on the left.
    const y1 = py(hi);
    const z1 = pz(hi);
    const dy = py(lo) - y1;
    const dz = pz(lo) - z1;
    // Along a straight line y = y1 + t dy, z = z1 + t dz, t from 0 to 1.
    area += y1 * dz + 0.5 * dy * dz;
    my += 0.5 * dz * (y1 * y1 + y1 * dy + (dy * dy) / 3);
    mz += dz * (y1 * z1 + 0.5 * (y1 * dz + z1 * dy) + (dy * dz) / 3);
  }
  out.area = area;
  out.momentY = my;
  out.momentZ = mz;
  chordsOf(out);
  return out;
}

/** The chord length and its moments along the line: the crossings' intervals and the on-line parts, merged. */
function chordsOf(out: CutValues): void {
  if (onFrom.length === 0 && crossings.length <= 2) {
    // The usual case: one chord, or none.
    const lo = crossings.length === 2 ? crossings[0]! : 0;
    const hi = crossings.length === 2 ? crossings[1]! : 0;
    out.chord = hi - lo;
    out.chordS = (hi * hi - lo * lo) / 2;
    out.chordS2 = (hi * hi * hi - lo * lo * lo) / 3;
    out.chords = crossings.length === 2 && hi > lo ? 1 : 0;
    out.chordFrom = out.chords === 1 ? lo : Number.NaN;
    out.chordTo = out.chords === 1 ? hi : Number.NaN;
    return;
  }
  const from: number[] = [];
  const to: number[] = [];
  for (let k = 0; k + 1 < crossings.length; k += 2) {
    from.push(crossings[k]!);
    to.push(crossings[k + 1]!);
  }
  for (let k = 0; k < onFrom.length; k++) {
    from.push(onFrom[k]!);
    to.push(onTo[k]!);
  }
  const order = from.map((_, k) => k).sort((p, q) => from[p]! - from[q]!);
  let length = 0;
  let m1 = 0;
  let m2 = 0;
  let curFrom = Number.NaN;
  let curTo = Number.NaN;
  let chords = 0;
  let lowest = Number.NaN;
  let highest = Number.NaN;
  const flush = (): void => {
    if (!(curTo > curFrom)) return;
    chords++;
    if (!(lowest <= curFrom)) lowest = curFrom;
    if (!(highest >= curTo)) highest = curTo;
    length += curTo - curFrom;
    m1 += (curTo * curTo - curFrom * curFrom) / 2;
    m2 += (curTo ** 3 - curFrom ** 3) / 3;
  };
  for (const k of order) {
    if (from[k]! <= curTo) curTo = Math.max(curTo, to[k]!);
    else {
      flush();
      curFrom = from[k]!;
      curTo = to[k]!;
    }
  }
  flush();
  out.chord = length;
  out.chordS = m1;
  out.chordS2 = m2;
  out.chords = chords;
  out.chordFrom = lowest;
  out.chordTo = highest;
}

/** The least value of -y sin φ + z cos φ over the section: the line with h below it misses the section. */
export function lowestAlong(bd: SectionBoundary, sin: number, cos: number): number {
  let least = Infinity;
  const f = new Float64Array(4);
  for (let k = 0; k < bd.count; k++) {
    const a1 = -bd.yMin[k]! * sin;
    const a2 = -bd.yMax[k]! * sin;
    const b1 = bd.zMin[k]! * cos;
    const b2 = bd.zMax[k]! * cos;
    if (Math.min(a1, a2) + Math.min(b1, b2) >= least) continue;
    const o = 4 * k;
    for (let j = 0; j < 4; j++) f[j] = -bd.cy[o + j]! * sin + bd.cz[o + j]! * cos;
    const s = bd.span[k]!;
    least = Math.min(least, cubicAt(f, 0, 0), cubicAt(f, 0, s));
    // Interior minima: where the derivative vanishes.
    const a = f[1]!;
    const b = 2 * f[2]!;
    const q = 3 * f[3]!;
    const cands: number[] = [];
    if (q === 0) {
      if (b !== 0) cands.push(-a / b);
    } else {
      const disc = b * b - 4 * a * q;
      if (disc >= 0) {
        cands.push((-b + Math.sqrt(disc)) / (2 * q), (-b - Math.sqrt(disc)) / (2 * q));
      }
    }
    for (const u of cands) if (u > 0 && u < s) least = Math.min(least, cubicAt(f, 0, u));
  }
  return least;
}
