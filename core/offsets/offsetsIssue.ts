/**
 * Issues of an offsets file: a path `["offsets", line, column]` (1-based, as an editor
 * shows them; the column left out when the issue is about a whole row, both left out
 * when it is about the whole file) and a message that names the same place in words.
 */
import { issue, type ErrorCode, type Issue } from '../common/errors.js';

/** `line 7, column 3 (station x = 1.5 m, WL 0.50 m)`, or the shorter forms when less is known. */
export function placeText(line: number | undefined, column: number | undefined, where: string | undefined): string {
  const at = line === undefined ? '' : column === undefined ? `line ${line}` : `line ${line}, column ${column}`;
  if (where === undefined) return at;
  return at === '' ? where : `${at} (${where})`;
}

/** One issue of an offsets file: `rule` says what is wrong, in plain words with the value. */
export function csvIssue(
  code: ErrorCode,
  line: number | undefined,
  column: number | undefined,
  where: string | undefined,
  rule: string,
): Issue {
  const path: (string | number)[] = ['offsets'];
  if (line !== undefined) {
    path.push(line);
    if (column !== undefined) path.push(column);
  }
  const place = placeText(line, column, where);
  return issue(code, path, place === '' ? rule : `${place}: ${rule}`);
}

/** Issues in file order (by line, then column; whole-file issues last), each place and rule once. */
export function inFileOrder(issues: readonly Issue[]): Issue[] {
  const seen = new Set<string>();
  const kept: Issue[] = [];
  for (const i of issues) {
    const key = `${i.code}|${i.path.join('|')}`;
    if (!seen.has(key)) {
      seen.add(key);
      kept.push(i);
    }
  }
  const rank = (i: Issue, k: number): number => {
    const v = i.path[k];
    return typeof v === 'number' ? v : k === 1 ? Number.POSITIVE_INFINITY : 0;
  };
  return kept.sort((a, b) => rank(a, 1) - rank(b, 1) || rank(a, 2) - rank(b, 2));
}
