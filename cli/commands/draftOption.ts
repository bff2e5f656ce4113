/**
 * The single `--draft <m>` of the commands that work at one waterline (sheet, areas):
 * one plain decimal number of metres (core/common/decimal.ts), named as the option in
 * every message.
 */
import { readDecimal } from '../../core/common/decimal.js';
import { fail } from '../../core/common/errors.js';

export function singleDraft(text: string | undefined): number {
  const value = readDecimal(text ?? '');
  if (!Number.isFinite(value)) {
    fail('HYD_DRAFT_LIST', ['--draft'], `--draft '${(text ?? '').slice(0, 40)}' is not one number of metres; give one draft above the baseline, e.g. --draft 1.3`);
  }
  return value;
}
