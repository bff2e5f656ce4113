/**
 * The table of an offsets file once its lines are split into cells, and the map from
 * the hull model built from it back to lines and columns.
 */
import type { Issue } from '../common/errors.js';
import type { Station } from '../hull/hullModel.js';
import type { LengthUnit } from '../common/units.js';
import type { ReadingWarning } from './readingWarnings.js';

export interface Sheet {
  readonly unit: LengthUnit;
  /** Metres per unit of the file's numbers (lengthFactor of the unit). */
  readonly factor: number;
  /** Written after a value in messages: ` m`, ` mm`...; nothing for ft-in-8, whose notation says it. */
  readonly label: string;
  readonly headerLine: number;
  /** Header cells, trimmed. */
  readonly header: readonly string[];
  /** The rows after the header, cells as written. */
  readonly rows: readonly (readonly string[])[];
  /** 1-based line of each row. */
  readonly rowLines: readonly number[];
  /** True when the cells are split on a semicolon or a tab, so that `0,25` is a decimal comma. */
  readonly decimalComma?: boolean;
}

export const unitLabel = (u: LengthUnit): string => (u === 'ft-in-8' ? '' : ` ${u}`);

/** Cell `c` of a row, trimmed; a missing cell reads as blank. */
export const cellText = (row: readonly string[], c: number): string => {
  const t = row[c];
  return t === undefined ? '' : t.trim();
};

/**
 * True when a row has a cell holding more than spaces beyond the header's `ncol` columns.
 * Blank cells there are what a spreadsheet writes for empty columns and are ignored.
 */
export function hasCellsBeyond(row: readonly string[], ncol: number): boolean {
  for (let c = ncol; c < row.length; c++) if (row[c]!.trim() !== '') return true;
  return false;
}

/**
 * Where each part of the model came from. Grid: the row of each station and the column
 * (0-based) of each of its points. Points: the first row of each station, the row of
 * each point, and the columns
 * (0-based) of x, y and z.
 */
export type SourceMap =
  | {
      readonly form: 'grid';
      readonly stationRow: readonly number[];
      readonly pointCol: readonly (readonly number[])[];
      /** Column (0-based) of the first waterline height: 1, or more after the optional columns. */
      readonly first: number;
    }
  | {
      readonly form: 'points';
      /** Row where each station begins. */
      readonly stationRow: readonly number[];
      readonly pointRow: readonly (readonly number[])[];
      readonly xCol: number;
      readonly yCol: number;
      readonly zCol: number;
    };

/** What reading the rows of a table gives. */
export interface BodyRead {
  readonly stations: Station[];
  readonly issues: Issue[];
  readonly map: SourceMap;
  /** Model stations some of whose cells were left out because they could not be read. */
  readonly tainted: ReadonlySet<number>;
  /** True when whole station rows were left out (their x could not be read). */
  readonly rowsLeftOut: boolean;
  /** True when reading stopped (the table is over a size limit). */
  readonly stopped: boolean;
  /** Warnings about how the table is written (core/offsets/readingWarnings.ts). */
  readonly notes?: readonly ReadingWarning[];
}
