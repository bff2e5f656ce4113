/**
 * Aligned text tables for the terminal: a heading line, a units line, the rows, then
 * the caution. Numbers are shown to a fixed number of decimals by unit (JSON and CSV
 * keep full precision); one place for both unit systems.
 */
import { CAUTION } from '../common/caution.js';

/** Decimals shown for each unit. */
export const TEXT_DECIMALS: Readonly<Record<string, number>> = {
  m: 3, m2: 2, m3: 3, m4: 1, t: 2, 't/cm': 3, 't.m/cm': 3,
  ft: 3, ft2: 1, ft3: 1, ft4: 0, LT: 2, 'LT/in': 3, 'LT.ft/in': 2,
  '-': 4,
};

/** A number for a text table: fixed decimals by unit, `-` where undefined. */
export function textCell(value: number, unit: string): string {
  return Number.isFinite(value) ? value.toFixed(TEXT_DECIMALS[unit] ?? 3) : '-';
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
