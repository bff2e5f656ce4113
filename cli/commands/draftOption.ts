/**
 * The single `--draft` of the commands that work at one waterline (sheet, areas): one
 * length typed in the answer's unit system (core/common/typedLength.ts: metres, or with
 * --units imperial feet, decimal or feet-inches-eighths), named as the option in every
 * message. Given back in metres.
 */
import { fail } from '../../core/common/errors.js';
import { readTypedLength, TYPED_LENGTH_HINT } from '../../core/common/typedLength.js';
import type { UnitSystem } from '../../core/common/units.js';

export function singleDraft(text: string | undefined, system: UnitSystem = 'si'): number {
  const value = readTypedLength(text ?? '', system);
  if (!Number.isFinite(value)) {
    const eg = system === 'si' ? '--draft 1.3' : '--draft 4.25 or --draft 4-3-0';
    fail('HYD_DRAFT_LIST', ['--draft'], `--draft '${(text ?? '').slice(0, 40)}' is not ${TYPED_LENGTH_HINT[system]}; give one draft above the baseline, e.g. ${eg}`);
  }
  return value;
}
