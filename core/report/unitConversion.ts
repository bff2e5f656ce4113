/**
 * Results in the unit system a request asks for, converted in one place.
 *
 * Every result is computed in SI. A result declares the unit of each of its numbers in a
 * unit tree, a plain object shaped like the result (a unit string at each number, a
 * one-element array for every element of an array); `convertResult` walks the result and
 * its tree together and multiplies each number by its unit's factor, renaming the fields
 * whose name says their unit (TPC becomes TPI). The factors and names of the imperial
 * system are core/report/imperial.ts's, which imports mathjs; `converterFor('imperial')`
 * loads it only when it is asked for, so SI answers never pay for its import.
 */
import { metresInWords } from '../common/lengthWords.js';
import type { UnitSystem } from '../common/units.js';

/** The unit of a result's numbers, shaped like the result. */
export type UnitTree = string | { readonly [key: string]: UnitTree } | readonly [UnitTree];

/** A unit of the output system and the factor from its SI unit (output = SI x factor). */
export interface UnitConversion {
  readonly unit: string;
  readonly factor: number;
}

export interface Converter {
  readonly system: UnitSystem;
  /** The output unit of an SI unit; an unknown unit (t/m3, a count) is kept as it is. */
  unit(siUnit: string): UnitConversion;
  /** The output name of a field of an SI unit (`tpc` in t/cm is `tpi` in LT/in). */
  key(key: string, siUnit: string): string;
  /** The output label of a field (`TPC` is `TPI`). */
  label(key: string, label: string, siUnit: string): string;
  /** A length given in metres, as text in the output's length unit: `1.2 m`, `3.93701 ft`. */
  length(metres: number): string;
}

/** SI: every number as computed. */
export const SI_CONVERTER: Converter = {
  system: 'si',
  unit: (u) => ({ unit: u, factor: 1 }),
  key: (k) => k,
  label: (_k, l) => l,
  length: metresInWords,
};

/** The converter of a unit system; imperial loads core/report/imperial.ts (and mathjs) on first use. */
export async function converterFor(system: UnitSystem): Promise<Converter> {
  if (system === 'si') return SI_CONVERTER;
  const { IMPERIAL_CONVERTER } = await import('./imperial.js');
  return IMPERIAL_CONVERTER;
}

/** The output unit of every unit string in a tree, as a flat list of its leaves. */
function convertValue(value: unknown, tree: UnitTree | undefined, conv: Converter): unknown {
  if (tree === undefined || value === null || value === undefined) return value;
  if (typeof tree === 'string') {
    if (typeof value === 'number') {
      const f = conv.unit(tree).factor;
      return f === 1 ? value : value * f;
    }
    return value;
  }
  if (Array.isArray(value)) {
    const each = Array.isArray(tree) ? (tree as readonly [UnitTree])[0] : undefined;
    return each === undefined ? value : value.map((v) => convertValue(v, each, conv));
  }
  if (typeof value !== 'object' || Array.isArray(tree)) return value;
  const t = tree as { readonly [key: string]: UnitTree };
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value as Record<string, unknown>)) {
    const sub = t[k];
    const name = typeof sub === 'string' ? conv.key(k, sub) : k;
    out[name] = convertValue(v, sub, conv);
  }
  return out;
}

/**
 * The result in the converter's units: each number with a unit in `tree` multiplied by
 * its factor, fields renamed where the unit names them; anything else as it is. SI gives
 * the result itself.
 */
export function convertResult<R>(result: R, tree: UnitTree, conv: Converter): R {
  if (conv.system === 'si') return result;
  return convertValue(result, tree, conv) as R;
}
