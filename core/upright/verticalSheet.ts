/**
 * The vertical calculation sheet of one station: the immersed area of its section set
 * out as ordinates, Simpson's multipliers and products, as a sheet of the trade is.
 *
 * Method: the section (core/hull/section.ts) is read between its corners (the keel, each
 * knuckle, the deck edge) as a chain of Simpson panels of its offsets: a parabola through
 * each three, a cubic through the last four of a run with an odd number of intervals, a
 * straight line where a run has two points. Where z rises strictly along a run, the
 * half-breadth is a function y(z) and the area below the waterline is a linear
 * functional of the ordinates: its weight on each ordinate is the integral of that
 * ordinate's Lagrange basis polynomial over the immersed part of its panel. Panels wholly
 * below the draft give the ordinary Simpson weights (core/quadrature/simpson.ts simpsonWeights of
 * the panel); the panel that the waterline cuts gives the integral of its basis
 * polynomials from the panel's foot to the draft, so the ordinates of that panel above
 * the draft carry weights too (often negative): the last part is taken from the same
 * fitted curve the hydrostatics use, not from a new ordinate at the draft.
 *
 * A run along which z does not rise strictly (a flat given as points at one height) is
 * parameterised by chord length in core/hull/section.ts and is not a linear functional of its
 * ordinates; its part of the area is taken from the section directly and shown as one
 * line of the sheet.
 *
 * The flat of bottom (keel point to the centreline) and the flat deck add no area.
 * The sheet's area is checked against the section's own (`sectionArea`); they agree to
 * rounding because both integrate the same polynomials exactly.
 *
 * Reference for the layout: C. B. Barrass & D. R. Derrett, Ship Stability for Masters and
 * Mates, 7th ed. (Butterworth-Heinemann, 2012), ch. 10 (Simpson's rules set out as
 * ordinates, multipliers and products).
 */
import { metresInWords } from '../common/lengthWords.js';
import { GL5_T, GL5_W } from '../quadrature/gauss.js';
import type { Section, SectionPointInput } from '../hull/section.js';
import { commonSpacing, simpsonPanels, simpsonWeights } from '../quadrature/simpson.js';

/** One ordinate of a vertical sheet. Multiplier and product are null on a run taken along its curve. */
export interface VerticalOrdinate {
  /** Index of the point in the station's list (keel = 0). */
  readonly point: number;
  /** Height of the ordinate, m. */
  readonly z: number;
  /** Half-breadth, m. */
  readonly halfBreadth: number;
  /** Weight of the ordinate divided by h/3 (h the sheet's spacing). */
  readonly multiplier: number | null;
  /** halfBreadth x multiplier, m. */
  readonly product: number | null;
  /** True for an ordinate above the draft that enters through the panel the waterline cuts. */
  readonly aboveDraft: boolean;
}

/** A run of the section whose z does not rise strictly: its area is read from the section's curve. */
export interface CurvePart {
  readonly zFrom: number;
  readonly zTo: number;
  /** Area of one side over the part, m². */
  readonly area: number;
}

/** The panel that the waterline cuts, when the draft is not a tabulated height. */
export interface CutPanel {
  readonly rule: 'straight line' | 'parabola' | 'cubic';
  /** Heights of the panel's ordinates, m. */
  readonly heights: readonly number[];
  /** Foot of the panel: the curve is integrated from here to the draft, m. */
  readonly from: number;
}

export interface VerticalSheet {
  readonly draft: number;
  /** Keel height of the station, m. */
  readonly keel: number;
  /** False when the keel is at or above the draft: no ordinate, no area. */
  readonly immersed: boolean;
  /** The most common interval of the listed ordinates' heights, m (h of the multipliers). */
  readonly spacing: number;
  /** h/3, m. */
  readonly commonFactor: number;
  readonly ordinates: readonly VerticalOrdinate[];
  /** Sum of the products, m. */
  readonly sum: number;
  readonly curveParts: readonly CurvePart[];
  readonly cutPanel: CutPanel | null;
  /** Half-breadth at the draft, read from the fitted section, m (for the waterplane sheet). */
  readonly waterlineHalfBreadth: number;
  /** 2 x (h/3 x sum + curve parts): the immersed area of both sides, m². */
  readonly area: number;
  /** The section's own immersed area at the draft (core/hull/section.ts), m², for the check. */
  readonly sectionArea: number;
  /** How the last part below the waterline is taken, in words. */
  readonly lastPart: string;
}

/** Integral over [a, b] of the Lagrange basis polynomial of each of `z` (2 to 4 nodes), added into `out[k]`. */
function addBasisIntegrals(z: readonly number[], a: number, b: number, out: number[]): void {
  const span = b - a;
  for (let g = 0; g < GL5_T.length; g++) {
    const t = a + GL5_T[g]! * span;
    const wg = GL5_W[g]! * span;
    for (let k = 0; k < z.length; k++) {
      let basis = 1;
      for (let m = 0; m < z.length; m++) if (m !== k) basis *= (t - z[m]!) / (z[k]! - z[m]!);
      out[k]! += wg * basis;
    }
  }
}

const RULE: Record<number, CutPanel['rule']> = { 2: 'straight line', 3: 'parabola', 4: 'cubic' };

/** Each panel rule as a checker names it. Common practice, no source. */
const RULE_WORDS: Record<CutPanel['rule'], string> = {
  'straight line': 'panel of two ordinates, taken by the trapezoidal rule (the straight line between them)',
  parabola: "Simpson's first-rule panel (the parabola through its three ordinates)",
  cubic: "Simpson's second-rule panel (the cubic through its four ordinates)",
};

/**
 * The vertical sheet of a station's section at a draft. `points` are the station's
 * points as given to the section (keel first); `section` is its fitted section.
 * A draft at or below the keel gives an empty sheet; a draft at or above the deck
 * edge integrates the whole section.
 */
export function verticalSheet(points: readonly SectionPointInput[], section: Section, draft: number, len: (metres: number) => string = metresInWords): VerticalSheet {
  const n = points.length;
  const atDraft = section.evaluate(draft);
  const sectionArea = atDraft.area;
  const waterlineHalfBreadth = atDraft.halfBreadth;
  if (!(draft > section.zKeel)) {
    return {
      draft,
      keel: section.zKeel,
      immersed: false,
      spacing: 0,
      commonFactor: 0,
      ordinates: [],
      sum: 0,
      curveParts: [],
      cutPanel: null,
      waterlineHalfBreadth: 0,
      area: 0,
      sectionArea,
      lastPart: `the keel (z = ${len(section.zKeel)}) is at or above the draft: the station is not immersed`,
    };
  }
  // Weights (one side, m) of the ordinates on y(z) runs; NaN marks a point on a curve run.
  const weight = new Array<number>(n).fill(0);
  const onCurve = new Array<boolean>(n).fill(false);
  const curveParts: CurvePart[] = [];
  let cutPanel: CutPanel | null = null;
  let highest = 0; // highest point index that carries a weight or lies on an immersed curve run

  const corners = [0];
  for (let k = 1; k < n - 1; k++) if (points[k]!.knuckle === true) corners.push(k);
  corners.push(n - 1);
  for (let r = 0; r + 1 < corners.length; r++) {
    const s = corners[r]!;
    const e = corners[r + 1]!;
    if (!(points[s]!.z < draft)) break;
    let strict = true;
    for (let k = s + 1; k <= e; k++) if (!(points[k]!.z > points[k - 1]!.z)) strict = false;
    if (!strict) {
      const zTo = Math.min(points[e]!.z, draft);
      const area = (section.evaluate(zTo).area - section.evaluate(points[s]!.z).area) / 2;
      curveParts.push({ zFrom: points[s]!.z, zTo, area });
      for (let k = s; k <= e; k++) onCurve[k] = true;
      highest = Math.max(highest, e);
      continue;
    }
    for (const panel of simpsonPanels(e - s + 1)) {
      const first = s + panel.start;
      const z: number[] = [];
      for (let k = 0; k < panel.size; k++) z.push(points[first + k]!.z);
      if (!(z[0]! < draft)) break;
      const top = z[z.length - 1]!;
      const w = top <= draft ? Array.from(simpsonWeights(z)) : new Array<number>(z.length).fill(0);
      if (top > draft) {
        addBasisIntegrals(z, z[0]!, draft, w);
        cutPanel = { rule: RULE[panel.size]!, heights: z, from: z[0]! };
      }
      for (let k = 0; k < panel.size; k++) weight[first + k]! += w[k]!;
      highest = Math.max(highest, first + panel.size - 1);
    }
  }

  const listed: number[] = [];
  for (let k = 0; k <= highest; k++) listed.push(k);
  const spacing = commonSpacing(listed.filter((k) => !onCurve[k]).map((k) => points[k]!.z));
  const commonFactor = spacing / 3;
  let sum = 0;
  const ordinates = listed.map((k): VerticalOrdinate => {
    const p = points[k]!;
    if (onCurve[k] && weight[k] === 0) {
      return { point: k, z: p.z, halfBreadth: p.y, multiplier: null, product: null, aboveDraft: p.z > draft };
    }
    const multiplier = commonFactor > 0 ? weight[k]! / commonFactor : 0;
    const product = p.y * multiplier;
    sum += product;
    return { point: k, z: p.z, halfBreadth: p.y, multiplier, product, aboveDraft: p.z > draft };
  });
  const curveArea = curveParts.reduce((a, c) => a + c.area, 0);
  const area = 2 * (commonFactor * sum + curveArea);

  let lastPart: string;
  if (draft >= section.zDeck) lastPart = `the draft is at or above the deck edge (z = ${len(section.zDeck)}): the whole section is taken`;
  else if (cutPanel === null) lastPart = `the draft ${len(draft)} is the height of an ordinate: the ordinates end at the waterline, each panel whole`;
  else {
    const hs = cutPanel.heights;
    const below = Math.max(...hs.filter((z) => z < draft));
    const above = Math.min(...hs.filter((z) => z > draft));
    lastPart =
      `the draft ${len(draft)} lies between the ordinates at z = ${len(below)} and z = ${len(above)}, inside the ` +
      `${RULE_WORDS[cutPanel.rule]} of the ordinates at z = ${hs.map(len).join(', ')}; that curve is integrated from the foot of the ` +
      `panel, z = ${len(cutPanel.from)}, up to the draft (not over the whole panel), which gives the multipliers of the panel's ordinates ` +
      'shown, so the ordinates above the draft carry multipliers too (often negative: the curve through them shapes the part below the waterline)';
  }
  if (curveParts.length > 0) lastPart += '; runs given at a constant height are taken along the section\'s fitted curve';
  return {
    draft,
    keel: section.zKeel,
    immersed: true,
    spacing,
    commonFactor,
    ordinates,
    sum,
    curveParts,
    cutPanel,
    waterlineHalfBreadth,
    area,
    sectionArea,
    lastPart,
  };
}
