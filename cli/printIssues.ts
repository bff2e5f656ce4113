/**
 * Issues as people read them on stderr, one a line, each led by the thing it is about:
 * the input file for the offsets (`offsets.csv: line 7, column 3 (station x = 1.5 m,
 * WL 0.50 m): half-breadth -0.3 < 0`), the option for a command-line value
 * (`--drafts: draft 3 m is outside the hull: ...`). The messages themselves come from
 * the core and already name the line, column or field and the rule. Control characters
 * that a file's text could bring into a message are shown as `?` (cli/io.ts terminalSafe).
 */
import type { Issue } from '../core/common/errors.js';
import { terminalSafe, type TextSink } from './io.js';

/**
 * Path roots that belong to a command-line option rather than to the input file: the
 * core names a value by its field (a load's `displacement`, the `openings` of a GZ
 * curve), and the line names the option that gave it.
 */
const OPTION_ROOTS: Readonly<Record<string, string>> = {
  drafts: '--drafts',
  draft: '--draft',
  density: '--density',
  displacement: '--displacement',
  displacements: '--displacements',
  heels: '--heels',
  kg: '--kg',
  openings: '--opening',
};

/**
 * What an issue is about, as printed before it. An issue at an option (`--heels`) is led
 * by the program when its message names the option, and by the option when it does not
 * (`--heels: heel 200 degrees is outside -180 to 180 degrees`), so every line says which
 * option broke which rule.
 */
export function issueSource(i: Issue, fileLabel: string | undefined, program: string): string {
  const root = i.path[0];
  if (typeof root === 'string') {
    const option = OPTION_ROOTS[root];
    if (option !== undefined) return option;
    if (root.startsWith('--')) return i.message.includes(root) ? program : root;
    if (root === 'argv') return program;
  }
  return fileLabel ?? program;
}

/** One line per issue, then a count when there is more than one. */
export function issueLines(issues: readonly Issue[], fileLabel: string | undefined, program: string): string[] {
  const lines = issues.map((i) => terminalSafe(`${issueSource(i, fileLabel, program)}: ${i.message}`));
  if (issues.length > 1) lines.push(`${program}: ${issues.length} problems found`);
  return lines;
}

export function printIssues(sink: TextSink, issues: readonly Issue[], fileLabel: string | undefined, program: string): void {
  sink.write(issueLines(issues, fileLabel, program).join('\n') + '\n');
}
