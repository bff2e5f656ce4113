/**
 * Reading an offsets file (CSV text) into a hull model in metres. Pure: text in, model
 * out, no file or network I/O. The file's forms, metadata and units are those of the
 * project's conventions (grid: `x` then waterline heights; points: columns x, y, z and
 * optionally knuckle). Every issue of a file is gathered and thrown at once, in one
 * HalfbreadthError, each issue with its path `["offsets", line, column]`.
 *
 * Files as spreadsheets export them are read as they come: a byte-order mark, CRLF line
 * ends and quoted cells (papaparse); cells split on a comma, a semicolon or a tab, the
 * one papaparse finds in the header row (tried in that order: semicolon, tab, comma,
 * and a comma is chosen only where it splits the row into more cells, which the `x`
 * cell's having no comma makes safe); a decimal comma (`0,25`) in every number when the
 * cells are not split on commas; blank cells and columns after the last header cell,
 * rows of nothing but delimiters, and the delimiters that pad a comment line to the
 * table's width, all ignored;
 * a comment line a spreadsheet quoted (`"# name: a; b";;`) read as its one cell; and a
 * unit in a header cell (`x (mm)`, core/offsets/headerUnit.ts).
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
import { headerUnit, unitConflicts } from './headerUnit.js';
import { readGridBody, readGridHeader } from './offsetsGrid.js';
import { csvIssue, inFileOrder } from './offsetsIssue.js';
import { misplacedMetadata, readMetadata, type CommentLine } from './offsetsMetadata.js';
import { placeHullIssues, pointPlace, type FilePlace } from './offsetsPlaces.js';
import { readPointsBody, readPointsHeader } from './offsetsPoints.js';
import { unitLabel, type BodyRead, type Sheet } from './offsetsSheet.js';
import { lengthFactor, type LengthUnit } from '../common/units.js';
import type { ReadingWarning } from './readingWarnings.js';

export { readHullJson } from './readHullJson.js';

export type OffsetsForm = 'grid' | 'points';

/** The delimiters a file's cells may be split on. */
export const DELIMITERS = [';', '\t', ','] as const;
export type Delimiter = (typeof DELIMITERS)[number];

export interface ReadResult {
  /** The hull, lengths in metres. */
  readonly hull: HullModel;
  readonly form: OffsetsForm;
  /** The unit the file was written in. */
  readonly units: LengthUnit;
  /** Warnings about how the table is written (core/offsets/readingWarnings.ts); the hull reads all the same. */
  readonly notes: readonly ReadingWarning[];
  /** What the cells were split on; a decimal comma was read when it is not a comma. */
  readonly delimiter: Delimiter;
  /** Where point `j` of station `i` of the hull was written: line, column, and the station and waterline as written. */
  readonly place: (station: number, point: number, field: 'y' | 'z') => FilePlace;
}

/** Options of a read. */
export interface ReadOptions {
  /** The unit of a file that gives none (no units line, no unit in its header): the request's input units. */
  readonly inputUnits?: LengthUnit | undefined;
}

const HASH = 35;
const QUOTE_CODE = 34;
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

/** A comment line: `#` first, or a quoted first cell that begins with `#` (a spreadsheet quotes a cell holding its delimiter). */
function isComment(s: string): boolean {
  const c = firstNonSpace(s);
  if (c === HASH) return true;
  if (c !== QUOTE_CODE) return false;
  const q = s.indexOf(QUOTE);
  return s.charCodeAt(q + 1) === HASH;
}

/** A line of nothing but delimiters and spaces: an empty row as a spreadsheet writes it, no more a row than a blank line. */
function isEmptyRow(s: string): boolean {
  for (let i = 0; i < s.length; i++) {
    const ch = s[i]!;
    if (ch !== ' ' && ch !== '\t' && ch !== ',' && ch !== ';') return false;
  }
  return true;
}

/**
 * The delimiter of a file: the one papaparse finds in the header row, trying a
 * semicolon, then a tab, then a comma (see the module note); a comma when none splits it.
 */
export function detectDelimiter(header: string): Delimiter {
  const found = Papa.parse<string[]>(header, { delimitersToGuess: [...DELIMITERS], preview: 1 }).meta.delimiter;
  return (DELIMITERS as readonly string[]).includes(found) ? (found as Delimiter) : ',';
}

/**
 * A comment line as its text. A spreadsheet writes a note typed in the first cell as
 * that cell, quoted when it holds the delimiter or a quote, then one delimiter for each
 * other column of the table (`# units: mm;;;;`): a quoted line is read as its first
 * cell, and an unquoted one loses the `width - 1` delimiters that end it, where it ends
 * with that many (a comment written by hand, ending in a comma of its own, keeps it).
 */
function commentText(s: string, delimiter: Delimiter, width: number): string {
  if (firstNonSpace(s) === QUOTE_CODE) return Papa.parse<string[]>(s.trim(), { delimiter, header: false }).data[0]?.[0] ?? s;
  const t = s.trimEnd();
  const pad = width - 1;
  if (pad < 1 || t.length < pad) return s;
  for (let i = t.length - pad; i < t.length; i++) if (t[i] !== delimiter) return s;
  return t.slice(0, t.length - pad);
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
    if (isEmptyRow(s)) continue;
    if (isComment(s)) (header === undefined ? before : after).push({ line: k + 1, text: s });
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

function parseCells(texts: readonly string[], lines: readonly number[], delimiter: Delimiter): { rows: string[][]; issues: Issue[] } {
  const parsed = Papa.parse<string[]>(texts.join('\n'), { delimiter, newline: '\n', header: false, dynamicTyping: false, skipEmptyLines: false });
  const issues = parsed.errors.map((e) =>
    csvIssue('HYD_CSV_UNREADABLE', e.row === undefined ? undefined : lines[e.row], undefined, undefined, `the CSV cannot be read here: ${e.message}`),
  );
  if (issues.length === 0 && parsed.data.length !== texts.length) {
    issues.push(csvIssue('HYD_CSV_UNREADABLE', undefined, undefined, undefined, `the CSV reads as ${parsed.data.length} rows from ${texts.length} lines`));
  }
  return { rows: parsed.data, issues };
}

/** Cells after the first of each line that hold more than spaces: a grid's defined half-breadths, by a plain split. */
function definedCells(body: readonly string[], delimiter: Delimiter): number {
  let n = 0;
  for (const line of body) {
    const cells = line.split(delimiter);
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
export function readOffsetsCsv(text: string, options: ReadOptions = {}): ReadResult {
  const sorted = sortLines(text);
  const delimiter = sorted.header === undefined ? ',' : detectDelimiter(sorted.header);
  const decimalComma = delimiter !== ',';
  // The table's width as a spreadsheet wrote it: the header's cells, blank ones at its end included.
  const width = sorted.header === undefined ? 1 : (Papa.parse<string[]>(sorted.header, { delimiter, preview: 1 }).data[0]?.length ?? 1);
  const tidy = (c: CommentLine): CommentLine => ({ line: c.line, text: commentText(c.text, delimiter, width) });
  const lines = { ...sorted, before: sorted.before.map(tidy), after: sorted.after.map(tidy) };
  const issues: Issue[] = [];
  if (lines.header === undefined) {
    const meta = readMetadata(lines.before);
    issues.push(...meta.issues, csvIssue('HYD_CSV_UNREADABLE', undefined, undefined, undefined, 'the file has no header row and no stations'));
    fail(issues);
  }
  if (lines.body.length > LIMITS.maxPoints) {
    issues.push(csvIssue('HYD_TOO_LARGE', undefined, undefined, undefined, `the file has ${lines.body.length} rows after the header; the limit is ${LIMITS.maxPoints}`));
    fail(issues);
  }
  const quoteIssues = unpairedQuotes([lines.header, ...lines.body], [lines.headerLine, ...lines.bodyLines]);
  if (quoteIssues.length > 0) fail([...readMetadata(lines.before).issues, ...quoteIssues]);

  const head = parseCells([lines.header], [lines.headerLine], delimiter);
  if (head.issues.length > 0) fail([...readMetadata(lines.before).issues, ...head.issues]);
  const written = head.rows[0]!.map((c) => c.trim());
  // Blank cells after the last named or numbered one are empty columns of a spreadsheet.
  while (written.length > 1 && written[written.length - 1] === '') written.pop();
  const hu = headerUnit(written, lines.headerLine);
  issues.push(...hu.issues);
  const meta = readMetadata(lines.before, { fallbackUnits: hu.unit ?? options.inputUnits, decimalComma });
  issues.unshift(...meta.issues);
  for (const c of lines.after) {
    const m = misplacedMetadata(c, lines.headerLine);
    if (m !== undefined) issues.push(m);
  }
  if (meta.units !== undefined) {
    issues.push(
      ...unitConflicts({
        line: meta.unitsLine === undefined ? undefined : { unit: meta.units, at: meta.unitsLine },
        header: hu.unit === undefined ? undefined : { unit: hu.unit, at: lines.headerLine, column: hu.column! },
        input: options.inputUnits,
      }),
    );
  }
  const header = hu.cells;
  const names = header.map((c) => c.toLowerCase());
  const form: OffsetsForm | undefined =
    names.length > 1 && names.every(isWord) ? 'points' : names[0] === 'x' ? 'grid' : undefined;
  if (form === undefined) {
    const split = delimiter === '\t' ? 'tabs' : delimiter === ';' ? 'semicolons' : 'commas';
    issues.push(csvIssue('HYD_HEADER', lines.headerLine, 1, undefined,
      `the header begins '${header[0]}' (cells read as split on ${split}); it must be x then waterline heights (a grid of offsets), or name the columns x, y, z and optionally knuckle (a list of points)`));
    fail(issues);
  }
  const units = meta.units;
  if (units === undefined) fail(issues);

  const factor = lengthFactor(units);
  const sheetHead = { unit: units, factor, label: unitLabel(units), headerLine: lines.headerLine, header, decimalComma };
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
    // are parsed (which takes seconds for the largest bodies): counted by delimiters, which
    // is exact for a grid of numbers and an over-count only where a quoted cell holds one.
    if (lines.body.length * (header.length - 1) > LIMITS.maxPoints) {
      const defined = definedCells(lines.body, delimiter);
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
  const cells = parseCells(lines.body, lines.bodyLines, delimiter);
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
  return { hull, form, units, notes: body.notes ?? [], delimiter, place: (i, j, field) => pointPlace(sheet, body.map, i, j, field) };
}
