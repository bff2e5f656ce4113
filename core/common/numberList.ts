/**
 * Lists of numbers as people type them, for every list an answer takes (displacements,
 * heels): comma-separated values and inclusive ranges `from:step:to`, e.g. `5:2.5:15,16`.
 * Each value is read by `read` (a plain decimal by default, core/common/decimal.ts).
 */
import { readDecimal } from './decimal.js';
import { fail } from './errors.js';

export interface NumberListSpec {
  /** The list's name in messages: `displacements`, `heels`. */
  readonly noun: string;
  /** The issue code of a malformed list. */
  readonly code: 'HYD_DRAFT_LIST' | 'HYD_BAD_ARGUMENT';
  /** Most values in all. */
  readonly max: number;
  /** An example list, for the message of an empty one. */
  readonly example: string;
  /** Reads one value; NaN when it is not one. */
  readonly read?: (text: string) => number;
  /** How values are written, for the message of one that cannot be read. */
  readonly syntax?: string;
}

// Range values are rounded to 12 significant digits so that 0.2 + 0.1 * 1 reads 0.3.
const tidy = (v: number): number => Number(v.toPrecision(12));

/** The values of a typed list, ranges expanded; every fault names the item and the rule. */
export function parseNumberList(text: string, path: readonly (string | number)[], spec: NumberListSpec): number[] {
  const read = spec.read ?? readDecimal;
  const syntax = spec.syntax ?? 'numbers are plain decimals such as 1.25 or 2e-1';
  const out: number[] = [];
  if (text.trim() === '') fail(spec.code, path, `the ${spec.noun} list is empty; give values and ranges from:step:to such as ${spec.example}`);
  text.split(',').forEach((raw, k) => {
    const part = raw.trim();
    const where = `${spec.noun} item ${k + 1} "${part.slice(0, 40)}"`;
    const bits = part.split(':');
    const nums = bits.map((b) => read(b.trim()));
    if (nums.some((v) => !Number.isFinite(v))) fail(spec.code, [...path, k], `${where}: not a number or a range from:step:to (${syntax})`);
    if (bits.length === 1) {
      out.push(nums[0]!);
    } else if (bits.length === 3) {
      const [from, step, to] = nums as [number, number, number];
      if (!(step > 0)) fail(spec.code, [...path, k], `${where}: the step must be greater than zero`);
      if (to < from) fail(spec.code, [...path, k], `${where}: the range must run upwards (from <= to)`);
      const count = Math.floor((to - from) / step + 1e-9) + 1;
      if (out.length + count > spec.max) fail(spec.code, [...path, k], `${where}: more than ${spec.max} ${spec.noun} in all`);
      for (let i = 0; i < count; i++) out.push(tidy(from + i * step));
    } else {
      fail(spec.code, [...path, k], `${where}: a range is written from:step:to`);
    }
    if (out.length > spec.max) fail(spec.code, [...path, k], `more than ${spec.max} ${spec.noun} in all`);
  });
  return out;
}
