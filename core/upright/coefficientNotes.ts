/**
 * Why a form coefficient of the table is not given. A coefficient is a ratio of the hull
 * to a figure that encloses it (Cb the block of LWL x BWL x draft, Cm the rectangle BWL x
 * draft, Cp the prism of the midship section over LWL, Cwp the rectangle LWL x BWL), so
 * a value above 1 is never a property of the hull: it means the enclosing figure does
 * not enclose, because the hull is wider below the waterline than at it (tumblehome, a
 * bulb), or its midship section is smaller than another section (Cp). The table then
 * gives no value (null in JSON, empty in CSV) rather than a number above 1, and these
 * notes say why; a coefficient whose figure has no size (nothing immersed at
 * amidships) is not given either. Definitions: E. C. Tupper, Introduction to Naval
 * Architecture, 5th ed. (Butterworth-Heinemann, 2013), ch. 2 (from memory).
 */
import type { HydrostaticRow } from './hydrostaticFields.js';

/** Ratios within this of 1 are 1: rounding, not a hull wider than its block. */
export const COEFFICIENT_ROUNDING = 1e-9;

/** The coefficient a / b: NaN where b is not positive or the ratio would exceed 1 (see the module note). */
export function coefficient(a: number, b: number): number {
  if (!(b > 0)) return Number.NaN;
  const r = a / b;
  if (r > 1 + COEFFICIENT_ROUNDING) return Number.NaN;
  return Math.min(r, 1);
}

const REASON: Readonly<Record<'cb' | 'cm' | 'cp' | 'cwp', string>> = {
  cb: 'the immersed hull is wider than BWL or longer than LWL somewhere below the waterline, so the block LWL x BWL x draft does not enclose it',
  cm: 'the midship section is wider below the waterline than at it',
  cp: 'the midship section is smaller than the hull\'s fullest section, so the prism on it does not enclose the hull',
  cwp: 'the waterplane is not enclosed by LWL x BWL',
};

const d3 = (v: number): string => String(Number(v.toPrecision(6)));

/** A sentence for every coefficient a row does not give, with the ratio it would have had; `length` writes the draft (in metres by default). */
export function coefficientNotes(rows: readonly HydrostaticRow[], length: (metres: number) => string = (m) => `${d3(m)} m`): string[] {
  const out: string[] = [];
  for (const r of rows) {
    const raw: Record<'cb' | 'cm' | 'cp' | 'cwp', [number, number]> = {
      cb: [r.volume, r.lwl * r.bwl * r.draft],
      cm: [r.am, r.bwl * r.draft],
      cp: [r.volume, r.am * r.lwl],
      cwp: [r.waterplaneArea, r.lwl * r.bwl],
    };
    for (const key of ['cb', 'cm', 'cp', 'cwp'] as const) {
      if (Number.isFinite(r[key])) continue;
      const [a, b] = raw[key];
      out.push(
        b > 0
          ? `draft ${length(r.draft)}: ${key} is not given: it would be ${d3(a / b)}, above 1, because ${REASON[key]}`
          : `draft ${length(r.draft)}: ${key} is not given: ${key === 'cp' || key === 'cm' ? 'nothing is immersed at amidships' : 'the waterplane has no size'}`,
      );
    }
  }
  return out;
}
