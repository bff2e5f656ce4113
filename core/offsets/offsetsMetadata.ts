/**
 * Metadata of an offsets file: comment lines of the form `# key: value` before the
 * header row, where the key is one word of letters (any case). The keys are `name`,
 * `units`, `ap` and `fp`, plus `caution`, the caution line that every file written by
 * Halfbreadth starts with, which is known and ignored. Any other key is an error.
 * Comments of any other shape (`# lines faired 3 May`, `#`) are plain comments.
 *
 * After the header, comments are plain comments, but a line that looks like one of the
 * metadata keys above (not `caution`) is an error: the file would otherwise be read
 * without it, in the wrong units perhaps.
 */
import type { Issue } from '../common/errors.js';
import { nameProblem } from '../common/hullName.js';
import { csvIssue } from './offsetsIssue.js';
import { readLength } from './lengthCell.js';
import { isLengthUnit, LENGTH_UNITS, type LengthUnit } from '../common/units.js';

export const METADATA_KEYS = ['name', 'units', 'ap', 'fp', 'caution'] as const;
type MetadataKey = (typeof METADATA_KEYS)[number];

const isKey = (k: string): k is MetadataKey => (METADATA_KEYS as readonly string[]).includes(k);

const METADATA_LINE = /^\s*#\s*([A-Za-z]+)\s*:(.*)$/;

/** A comment line of the metadata shape, its key lowercased and its value trimmed; undefined for plain comments. */
export function metadataShape(comment: string): { key: string; value: string } | undefined {
  const m = METADATA_LINE.exec(comment);
  if (m === null) return undefined;
  return { key: m[1]!.toLowerCase(), value: m[2]!.trim() };
}

/** A perpendicular given in the metadata: its value in the file's units and where it was written. */
export interface MetadataLength {
  readonly value: number;
  readonly text: string;
  readonly line: number;
}

export interface Metadata {
  readonly name: string | undefined;
  /** The file's unit; `fallbackUnits` (else `m`) when not given. Undefined when the `units` line is malformed. */
  readonly units: LengthUnit | undefined;
  /** The line of the `units` line, when there is one. */
  readonly unitsLine: number | undefined;
  readonly ap: MetadataLength | undefined;
  readonly fp: MetadataLength | undefined;
  /** True when an `ap` or `fp` line was given but could not be read. */
  readonly perpendicularFault: boolean;
  readonly issues: Issue[];
}

export interface CommentLine {
  readonly line: number;
  readonly text: string;
}

export interface MetadataOptions {
  /** The unit when there is no units line (from the x header cell or the request), else `m`. */
  readonly fallbackUnits?: LengthUnit | undefined;
  /** Read ap and fp with a decimal comma (a file split on semicolons or tabs). */
  readonly decimalComma?: boolean;
}

/** Read the comment lines that come before the header. */
export function readMetadata(comments: readonly CommentLine[], options: MetadataOptions = {}): Metadata {
  const issues: Issue[] = [];
  const given = new Map<MetadataKey, { line: number; value: string }>();
  for (const c of comments) {
    const m = metadataShape(c.text);
    if (m === undefined) continue;
    if (!isKey(m.key)) {
      issues.push(
        csvIssue('HYD_METADATA_UNKNOWN', c.line, undefined, undefined,
          `unknown metadata key '${m.key}'; the keys are name, units, ap and fp (write other notes as comments without 'word:' at their start)`),
      );
      continue;
    }
    if (m.key === 'caution') continue;
    const before = given.get(m.key);
    if (before !== undefined) {
      issues.push(csvIssue('HYD_METADATA_VALUE', c.line, undefined, undefined, `${m.key} is given twice (first on line ${before.line})`));
      continue;
    }
    // A units, ap or fp value holds no delimiter: any a spreadsheet left after it is padding.
    given.set(m.key, { line: c.line, value: m.key === 'name' ? m.value : m.value.replace(/[\s,;]+$/, '') });
  }

  let units: LengthUnit | undefined = options.fallbackUnits ?? 'm';
  const u = given.get('units');
  if (u !== undefined) {
    if (isLengthUnit(u.value)) units = u.value;
    else {
      units = undefined;
      issues.push(csvIssue('HYD_METADATA_VALUE', u.line, undefined, undefined, `units '${u.value}' is not one of ${LENGTH_UNITS.join(', ')}`));
    }
  }

  let name: string | undefined;
  const n = given.get('name');
  if (n !== undefined) {
    const problem = nameProblem(n.value);
    if (problem !== undefined) issues.push(csvIssue('HYD_METADATA_VALUE', n.line, undefined, undefined, `name ${problem}`));
    else name = n.value;
  }

  let perpendicularFault = false;
  const length = (key: 'ap' | 'fp'): MetadataLength | undefined => {
    const g = given.get(key);
    if (g === undefined || units === undefined) return undefined;
    const v = g.value === '' ? undefined : readLength(g.value, units, options.decimalComma);
    if (typeof v === 'number') return { value: v, text: g.value, line: g.line };
    perpendicularFault = true;
    const why = v === undefined ? 'is blank' : v.why;
    issues.push(csvIssue('HYD_METADATA_VALUE', g.line, undefined, undefined, `${key} ${why}; it must be an x position in the file's units (${units})`));
    return undefined;
  };
  const ap = length('ap');
  const fp = length('fp');
  return { name, units, unitsLine: u?.line, ap, fp, perpendicularFault, issues };
}

/** A comment after the header that looks like metadata other than the caution: an issue, else undefined. */
export function misplacedMetadata(c: CommentLine, headerLine: number): Issue | undefined {
  const m = metadataShape(c.text);
  if (m === undefined || !isKey(m.key) || m.key === 'caution') return undefined;
  return csvIssue('HYD_METADATA_PLACE', c.line, undefined, undefined,
    `metadata '${m.key}' lies after the header row (line ${headerLine}); metadata lines must come before the header`);
}
