/**
 * Reading an offsets file (CSV text) into a hull model in metres. Pure: text in, model
 * out, no file or network I/O. The file's forms, metadata and units are those of the
 * project's conventions (grid: `x` then waterline heights; points: columns x, y, z and
 * optionally knuckle). Every issue of a file is gathered and thrown at once, in one
 * HalfbreadthError, each issue with its path `["offsets", line, column]`.
 *
 * Cells are read with papaparse; comments and metadata are handled here, line by line,
 * so that line numbers stay those an editor shows. The geometric rules come from
 * `checkHull` (core/hull/hullRules.ts), run on the model and placed back on the file.
 */
import Papa from 'papaparse';
import { HalfbreadthError, type Issue } from '../common/errors.js';
import { checkHull } from '../hull/hullRules.js';
import type { HullModel } from '../hull/hullModel.js';
import { LIMITS } from '../common/limits.js';
import { readGridBody, readGridHeader } from './offsetsGrid.js';
import { csvIssue, inFileOrder } from './offsetsIssue.js';
import { misplacedMetadata, readMetadata, type CommentLine } from './offsetsMetadata.js';
import { placeHullIssues } from './offsetsPlaces.js';
import { readPointsBody, readPointsHeader } from './offsetsPoints.js';
import { unitLabel, type BodyRead, type Sheet } from './offsetsSheet.js';
import { lengthFactor, type LengthUnit } from '../common/units.js';
import type { ReadingWarning } from './readingWarnings.js';

export { readHullJson } from './readHullJson.js';

export type OffsetsForm = 'grid' | 'points';

export interface ReadResult {
  /** The hull, lengths in metres. */
  readonly hull: HullModel;
  readonly form: OffsetsForm;
  /** The unit the file was written in. */
  readonly units: LengthUnit;
  /** Warnings about how the table is written (core/offsets/readingWarnings.ts); the hull reads all the same. */
  readonly notes: readonly ReadingWarning[];
}

const HASH = 35;
const QUOTE = '"';

/** The lines of a file sorted into comments and table lines, with their 1-based line numbers. */
interface Lines {
  readonly before: CommentLine[];
  readonly after: CommentLine[];
  readonly headerLine: number;
  readonly header: string | undefined;
  readonly body: string[];
  readonly bodyLines: number[];
}

function firstNonSpace(s: string): number {
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c !== 32 && c !== 9) return c;
  }
  return -1;
}

function sortLines(text: string): Lines {
  const all = (text.charCodeAt(0) === 0xfeff ? text.slice(1) : text).split(/\r\n|\n|\r/);
  const before: CommentLine[] = [];
  const after: CommentLine[] = [];
  const body: string[] = [];
  const bodyLines: number[] = [];
  let header: string | undefined;
  let headerLine = 0;
  for (let k = 0; k < all.length; k++) {
    const s = all[k]!;
    const c = firstNonSpace(s);
    if (c === -1) continue;
    if (c === HASH) (header === undefined ? before : after).push({ line: k + 1, text: s });
    else if (header === undefined) {
      header = s;
      headerLine = k + 1;
    } else {
      body.push(s);
      bodyLines.push(k + 1);
    }
  }
  return { before, after, headerLine, header, body, bodyLines };
}

/** Issues for lines whose quotes do not pair up (a quoted cell would run on into the next line). */
function unpairedQuotes(texts: readonly string[], lines: readonly number[]): Issue[] {
  const found: Issue[] = [];
  for (let k = 0; k < texts.length; k++) {
    const s = texts[k]!;
    if (s.indexOf(QUOTE) < 0) continue;
    let n = 0;
    for (let i = s.indexOf(QUOTE); i >= 0; i = s.indexOf(QUOTE, i + 1)) n++;
    if (n % 2 === 1) found.push(csvIssue('HYD_CSV_UNREADABLE', lines[k], undefined, undefined, 'a quote is not closed on this line; a quoted cell may not run on to the next line'));
  }
  return found;
}

function parseCells(texts: readonly string[], lines: readonly number[]): { rows: string[][]; issues: Issue[] } {
  const parsed = Papa.parse<string[]>(texts.join('\n'), { delimiter: ',', newline: '\n', header: false, dynamicTyping: false, skipEmptyLines: false });
  const issues = parsed.errors.map((e) =>
    csvIssue('HYD_CSV_UNREADABLE', e.row === undefined ? undefined : lines[e.row], undefined, undefined, `the CSV cannot be read here: ${e.message}`),
  );
  if (issues.length === 0 && parsed.data.length !== texts.length) {
    issues.push(csvIssue('HYD_CSV_UNREADABLE', undefined, undefined, undefined, `the CSV reads as ${parsed.data.length} rows from ${texts.length} lines`));
  }
  return { rows: parsed.data, issues };
}

/** Cells after the first of each line that hold more than spaces: a grid's defined half-breadths, by a plain split. */
function definedCells(body: readonly string[]): number {
  let n = 0;
  for (const line of body) {
    const cells = line.split(',');
    for (let c = 1; c < cells.length; c++) if (cells[c]!.trim() !== '') n++;
  }
  return n;
}

const isWord = (s: string): boolean => {
  if (s.length === 0) return false;
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c < 97 || c > 122) return false;
  }
  return true;
};

function fail(issues: readonly Issue[]): never {
  throw new HalfbreadthError(inFileOrder(issues));
}

/**
 * Read an offsets file into a hull model in metres.
 *
 * Grid form: `hull.waterlines` holds the header heights and each defined cell becomes a
 * point `{ y, z, knuckle: false }`. Points form: each row becomes a point with the
 * knuckle as given (a blank knuckle cell is 0); there are no `waterlines`.
 *
 * @throws HalfbreadthError holding every issue of the file, in file order.
 */
export function readOffsetsCsv(text: string): ReadResult {
  const lines = sortLines(text);
  const meta = readMetadata(lines.before);
  const issues: Issue[] = [...meta.issues];
  for (const c of lines.after) {
    const m = misplacedMetadata(c, lines.headerLine);
    if (m !== undefined) issues.push(m);
  }
  if (lines.header === undefined) {
    issues.push(csvIssue('HYD_CSV_UNREADABLE', undefined, undefined, undefined, 'the file has no header row and no stations'));
    fail(issues);
  }
  if (lines.body.length > LIMITS.maxPoints) {
    issues.push(csvIssue('HYD_TOO_LARGE', undefined, undefined, undefined, `the file has ${lines.body.length} rows after the header; the limit is ${LIMITS.maxPoints}`));
    fail(issues);
  }
  const quoteIssues = unpairedQuotes([lines.header, ...lines.body], [lines.headerLine, ...lines.bodyLines]);
  if (quoteIssues.length > 0) fail([...issues, ...quoteIssues]);

  const head = parseCells([lines.header], [lines.headerLine]);
  if (head.issues.length > 0) fail([...issues, ...head.issues]);
  const header = head.rows[0]!.map((c) => c.trim());
  const names = header.map((c) => c.toLowerCase());
  const form: OffsetsForm | undefined =
    names.length > 1 && names.every(isWord) ? 'points' : names[0] === 'x' ? 'grid' : undefined;
  if (form === undefined) {
    issues.push(csvIssue('HYD_HEADER', lines.headerLine, 1, undefined,
      `the header begins '${header[0]}'; it must be x then waterline heights (a grid of offsets), or name the columns x, y, z and optionally knuckle (a list of points)`));
    fail(issues);
  }
  const units = meta.units;
  if (units === undefined) fail(issues);

  const factor = lengthFactor(units);
  const sheetHead = { unit: units, factor, label: unitLabel(units), headerLine: lines.headerLine, header };
  let waterlines: number[] | undefined;
  let readBody: (sheet: Sheet) => BodyRead;
  if (form === 'grid') {
    const gh = readGridHeader({ ...sheetHead, rows: [], rowLines: [] });
    issues.push(...gh.issues);
    if (gh.issues.length > 0) fail(issues);
    if (lines.body.length > LIMITS.maxStations) {
      issues.push(csvIssue('HYD_TOO_LARGE', undefined, undefined, undefined, `the file has ${lines.body.length} station rows; the limit is ${LIMITS.maxStations}`));
      fail(issues);
    }
    // A grid whose defined cells are over the points limit is refused before its cells
    // are parsed (which takes seconds for the largest bodies): counted by commas, which
    // is exact for a grid of numbers and an over-count only where a quoted cell holds one.
    if (lines.body.length * (header.length - 1) > LIMITS.maxPoints) {
      const defined = definedCells(lines.body);
      if (defined > LIMITS.maxPoints) {
        issues.push(csvIssue('HYD_TOO_LARGE', undefined, undefined, undefined, `the file has about ${defined} half-breadths; the limit is ${LIMITS.maxPoints} points`));
        fail(issues);
      }
    }
    waterlines = gh.waterlines;
    readBody = (sheet) => readGridBody(sheet, gh);
  } else {
    const ph = readPointsHeader(names, lines.headerLine);
    issues.push(...ph.issues);
    if (ph.issues.length > 0) fail(issues);
    readBody = (sheet) => readPointsBody(sheet, ph.columns);
  }
  const cells = parseCells(lines.body, lines.bodyLines);
  if (cells.issues.length > 0) fail([...issues, ...cells.issues]);
  const sheet: Sheet = { ...sheetHead, rows: cells.rows, rowLines: lines.bodyLines };
  const body = readBody(sheet);
  issues.push(...body.issues);
  if (body.stopped) fail(issues);

  const hull: HullModel = { name: meta.name ?? 'unnamed hull', stations: body.stations };
  if (meta.ap !== undefined) hull.ap = meta.ap.value * factor;
  if (meta.fp !== undefined) hull.fp = meta.fp.value * factor;
  if (waterlines !== undefined) hull.waterlines = waterlines;

  const found = checkHull(hull);
  if (found.length > 0) issues.push(...placeHullIssues(found, { sheet, body, meta, hull }));
  if (issues.length > 0) fail(issues);
  return { hull, form, units, notes: body.notes ?? [] };
}
