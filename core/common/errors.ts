/**
 * The error catalogue. Every rule that an input can break has one code here; the
 * command line prints the issues, the service maps the code of a failure to its HTTP
 * status in one place (server/problem.ts). `docs/errors.md` lists every code and a
 * test keeps the two in step.
 */

/** Where an issue lies: a path into the hull model or request (zod style) plus, for CSV input, the line and column. */
export interface Issue {
  readonly code: ErrorCode;
  /** Path into the input: `["offsets", line, column]` for CSV, `["stations", i, "points", j, "y"]` for a model. */
  readonly path: readonly (string | number)[];
  /** Plain words that name the place and the rule broken. */
  readonly message: string;
}

export const ERROR_CODES = {
  HYD_CSV_UNREADABLE: 'The CSV text cannot be read (quoting, encoding or no rows).',
  HYD_HEADER: 'The header row is missing or malformed for the offsets form.',
  HYD_CELL_NOT_NUMBER: 'A cell that must hold a length or number holds something else.',
  HYD_CELL_NOT_FINITE: 'A number is NaN or infinite.',
  HYD_HALF_BREADTH_NEGATIVE: 'A half-breadth is below zero.',
  HYD_X_NOT_INCREASING: 'Station x positions are not strictly increasing down the file.',
  HYD_Z_NOT_INCREASING: 'Waterline heights (or the z of a section\'s points) are not increasing.',
  HYD_BLANK_INSIDE_ROW: 'A blank cell lies between defined cells of a station.',
  HYD_KEEL_DECK: 'A keel_z, deck_z or deck_y cell of the grid form breaks its rule (keel above the lowest half-breadth, cells above the deck edge, deck height without half-breadth).',
  HYD_STATION_TOO_FEW_POINTS: 'A station has fewer than two defined points.',
  HYD_TOO_FEW_STATIONS: 'The hull has fewer than three stations.',
  HYD_KNUCKLE_VALUE: 'A knuckle cell holds something other than 0 or 1.',
  HYD_METADATA_UNKNOWN: 'A metadata key is not one the offsets files know.',
  HYD_METADATA_VALUE: 'A metadata value is malformed (unknown units, non-numeric ap or fp).',
  HYD_UNITS_CONFLICT: 'The unit of an offsets file is given twice and the two disagree (the units line, the x header cell, the input-units option).',
  HYD_METADATA_PLACE: 'A metadata line lies after the header row, where it would not be read.',
  HYD_PERPENDICULARS: 'The perpendiculars are not in order (fp must lie forward of ap).',
  HYD_TOO_LARGE: 'The input is larger than the documented limits.',
  HYD_VALUE_RANGE: 'A length or other number lies outside its documented physical range.',
  HYD_NOT_IMMERSED: 'At a draft the hull has no immersed volume or no waterplane, so its figures cannot be formed.',
  HYD_ROW_LENGTH: 'A row has more cells than the header.',
  HYD_MODEL_INVALID: 'A JSON hull model does not match the schema.',
  HYD_DRAFT_LIST: 'A drafts list is malformed, empty or too long.',
  HYD_DRAFT_OUT_OF_RANGE: 'A draft lies outside the hull (at or below the keel, or above the deck edge).',
  HYD_LOAD_OUT_OF_RANGE: 'A load the hull cannot float: a displacement of zero or less, too light for the offsets to resolve, or more than it displaces wholly immersed (or, level, within its deck), or a centre of gravity that no floating position balances.',
  HYD_ANGLE_RANGE: 'A heel or trim lies outside its range.',
  HYD_DECK_NOT_GIVEN: "Heeled work needs every station's deck edge, which the offsets leave unsaid at some stations.",
  HYD_CRITERIA: 'A stability criteria set is malformed: an unknown criterion, a threshold that is not a number.',
  HYD_OPENING: 'An opening (downflooding point) lies outside the hull.',
  HYD_DENSITY: 'The water density is not a positive number in a plausible range.',
  HYD_BAD_ARGUMENT: 'A command-line or query argument is malformed.',
} as const;

export type ErrorCode = keyof typeof ERROR_CODES;

/** A failure of input, carrying every issue found (not just the first). */
export class HalfbreadthError extends Error {
  readonly code: ErrorCode;
  readonly issues: readonly Issue[];

  constructor(issues: readonly Issue[], summary?: string) {
    const first = issues[0];
    if (first === undefined) throw new TypeError('HalfbreadthError needs at least one issue');
    super(summary ?? (issues.length === 1 ? first.message : `${issues.length} problems; first: ${first.message}`));
    this.name = 'HalfbreadthError';
    this.code = first.code;
    this.issues = issues;
  }
}

export function issue(code: ErrorCode, path: readonly (string | number)[], message: string): Issue {
  return { code, path, message };
}

/** Throw one issue as an error. */
export function fail(code: ErrorCode, path: readonly (string | number)[], message: string): never {
  throw new HalfbreadthError([issue(code, path, message)]);
}

export function isHalfbreadthError(e: unknown): e is HalfbreadthError {
  return e instanceof HalfbreadthError;
}
