/**
 * Drafts lists as people type them: comma-separated values and inclusive ranges
 * `from:step:to`, e.g. `0.2:0.1:1.2,1.25`. Values are metres, each a plain decimal
 * (core/common/decimal.ts: no hexadecimal or binary); when the request asks for imperial
 * units they are feet, decimal or feet-inches-eighths (`2-0-0:0-3-0:4-0-0`;
 * core/common/typedLength.ts). The list is built in the unit typed and given in metres.
 */
import { fail } from './errors.js';
import { LIMITS } from './limits.js';
import { readTypedValue, TYPED_LENGTH_UNIT, typedLengthFactor } from './typedLength.js';
import type { UnitSystem } from './units.js';

// Range values are rounded to 12 significant digits so that 0.2 + 0.1 * 1 reads 0.3.
const tidy = (v: number): number => Number(v.toPrecision(12));

export function parseDraftList(text: string, path: readonly (string | number)[] = ['drafts'], system: UnitSystem = 'si'): number[] {
  const u = TYPED_LENGTH_UNIT[system];
  const out: number[] = [];
  const parts = text.split(',').map((s) => s.trim());
  if (text.trim() === '') fail('HYD_DRAFT_LIST', path, 'the drafts list is empty; give values like 0.5,0.6 or a range 0.2:0.1:1.2');
  parts.forEach((part, k) => {
    const where = `drafts item ${k + 1} "${part.slice(0, 40)}"`;
    const bits = part.split(':');
    const nums = bits.map((b) => readTypedValue(b, system));
    const syntax = system === 'si' ? 'numbers are plain decimals such as 1.25 or 2e-1' : `lengths are ${u}: decimal feet such as 2.5 or feet-inches-eighths such as 2-6-0`;
    if (nums.some((v) => !Number.isFinite(v))) fail('HYD_DRAFT_LIST', [...path, k], `${where}: not a number or a range from:step:to (${syntax})`);
    if (bits.length === 1) {
      out.push(nums[0]!);
    } else if (bits.length === 3) {
      const [from, step, to] = nums as [number, number, number];
      if (!(step > 0)) fail('HYD_DRAFT_LIST', [...path, k], `${where}: the step must be greater than zero`);
      if (to < from) fail('HYD_DRAFT_LIST', [...path, k], `${where}: the range must run upwards (from <= to)`);
      const count = Math.floor((to - from) / step + 1e-9) + 1;
      if (out.length + count > LIMITS.maxDrafts) fail('HYD_DRAFT_LIST', [...path, k], `${where}: more than ${LIMITS.maxDrafts} drafts in all`);
      for (let i = 0; i < count; i++) out.push(tidy(from + i * step));
    } else {
      fail('HYD_DRAFT_LIST', [...path, k], `${where}: a range is written from:step:to`);
    }
    if (out.length > LIMITS.maxDrafts) fail('HYD_DRAFT_LIST', [...path, k], `more than ${LIMITS.maxDrafts} drafts in all`);
  });
  const factor = typedLengthFactor(system);
  return factor === 1 ? out : out.map((v) => v * factor);
}
