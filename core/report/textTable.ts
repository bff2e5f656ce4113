/**
 * Aligned text tables for the terminal: a heading line, a units line, the rows, then
 * the caution. Numbers are shown to a fixed number of decimals by unit, or to three
 * significant digits where the decimals would hide a small value (JSON and CSV keep the
 * answer's digits); one place for both unit systems.
 */
import { CAUTION } from '../common/caution.js';

/** Decimals shown for each unit. */
export const TEXT_DECIMALS: Readonly<Record<string, number>> = {
  m: 3, m2: 2, m3: 3, m4: 1, t: 2, 't/cm': 3, 't.m/cm': 3,
  ft: 3, ft2: 1, ft3: 1, ft4: 0, LT: 2, 'LT/in': 3, 'LT.ft/in': 2,
  deg: 2, 'm.rad': 4, 'ft.rad': 4, 't.m': 2, 'LT.ft': 2,
  '-': 4,
};

/** Significant digits a text cell shows at least: fewer fixed decimals would print a small craft's MCT 1 cm as 0.000. */
export const TEXT_SIGNIFICANT = 3;

/** Significant digits of a number written with fixed decimals (`0.012` has 2, `0.000` none). */
function significantOf(fixed: string): number {
  let n = 0;
  let leading = true;
  for (const ch of fixed) {
    if (ch < '0' || ch > '9') continue;
    if (leading && ch === '0') continue;
    leading = false;
    n++;
  }
  return n;
}

/**
 * A number for a text table: fixed decimals by unit, so a column lines up; where that
 * would show fewer than three significant digits of a value that is not zero, the value
 * to three significant digits instead (0.000412, not 0.000); `-` where undefined.
 * @example textCell(0.000412, 't.m/cm') // '0.000412'
 * @example textCell(13.79, 'm3') // '13.790'
 */
export function textCell(value: number, unit: string): string {
  if (!Number.isFinite(value)) return '-';
  const fixed = value.toFixed(TEXT_DECIMALS[unit] ?? 3);
  if (value === 0 || significantOf(fixed) >= TEXT_SIGNIFICANT || Math.abs(value) >= 1) return fixed;
  // Trailing zeros kept (0.0500, not 0.05): they are significant, and a column reads evenly.
  const precise = value.toPrecision(TEXT_SIGNIFICANT);
  return precise.includes('e') ? String(Number(precise)) : precise;
}

export interface TextColumn {
  readonly label: string;
  readonly unit: string;
  readonly cells: readonly string[];
}

/** The table with `preamble` lines above it and `notes` under it, before the caution. */
export function alignedTable(preamble: readonly string[], columns: readonly TextColumn[], rowCount: number, notes: readonly string[] = []): string {
  const cols = columns.map((c) => {
    const unit = c.unit === '-' ? '' : c.unit;
    const width = Math.max(c.label.length, unit.length, ...c.cells.map((s) => s.length));
    return { head: c.label.padStart(width), unit: unit.padStart(width), cells: c.cells.map((s) => s.padStart(width)) };
  });
  const lines = [
    ...preamble,
    cols.map((c) => c.head).join('  '),
    cols.map((c) => c.unit).join('  '),
    ...Array.from({ length: rowCount }, (_, i) => cols.map((c) => c.cells[i]).join('  ')),
    ...(notes.length > 0 ? ['', ...notes] : []),
    '',
    CAUTION,
  ];
  return lines.join('\n') + '\n';
}
