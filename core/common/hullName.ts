/**
 * The rule for a hull's name, wherever it comes in (an offsets file's `# name:` line, a
 * JSON model, a query or body field): at most LIMITS.maxNameLength characters and no
 * control character, line or paragraph separator. Such characters could end a CSV
 * comment line, split a cell for a spreadsheet that reads tabs as separators, or
 * rewrite a terminal, so they are refused where the name comes in rather than hidden on
 * the way out.
 */
import { LIMITS } from './limits.js';

/** Matches a name with none of the refused characters. */
export const NAME_PATTERN = /^[^\p{Cc}\p{Zl}\p{Zp}]*$/u;

/** Why a name cannot be taken, in words that follow "name", or undefined when it can. */
export function nameProblem(name: string): string | undefined {
  if (name.length > LIMITS.maxNameLength) return `is ${name.length} characters long; the limit is ${LIMITS.maxNameLength}`;
  if (!NAME_PATTERN.test(name)) return 'holds a control character or line break (a tab, say); names are one line of printable text';
  return undefined;
}
