/**
 * The three forms of a hydrostatic table: CSV whose headers carry units, JSON with the
 * field names of the conventions, and the text table. The figures come from a box barge,
 * whose particulars are closed-form, so the forms are checked against values worked out
 * by hand rather than against the code's own output.
 */
import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { hydrostaticResult, hydrostaticsCsv, hydrostaticsText, toJson, type HydrostaticResult } from '../../core/report/formatHydrostatics.js';
import type { HullModel } from '../../core/hull/hullModel.js';
import { hydrostaticTable } from '../../core/upright/hydrostatics.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { boxBarge } from '../fixtures/hulls.js';
import '../helpers/relClose.js';

/**
 * The field names of a hydrostatic row, in the order of the field table of the
 * project's conventions (shared conventions, "Hydrostatic particulars"), each with the
 * unit that table gives it; '' for the coefficients, which have none.
 */
const CONVENTION_FIELDS: readonly [string, string][] = [
  ['draft', 'm'], ['volume', 'm3'], ['displacement', 't'], ['lcb', 'm'], ['vcb', 'm'],
  ['waterplaneArea', 'm2'], ['lcf', 'm'], ['iT', 'm4'], ['iL', 'm4'], ['bmt', 'm'], ['bml', 'm'],
  ['kmt', 'm'], ['kml', 'm'], ['tpc', 't/cm'], ['mct1cm', 't.m/cm'], ['lwl', 'm'], ['bwl', 'm'],
  ['am', 'm2'], ['cb', ''], ['cm', ''], ['cp', ''], ['cwp', ''], ['wettedSurface', 'm2'],
];

/** The CSV header each field must have: its name, an underscore and its unit written with letters, digits and `_per_`. */
const EXPECTED_HEADERS = [
  'draft_m', 'volume_m3', 'displacement_t', 'lcb_m', 'vcb_m', 'waterplaneArea_m2', 'lcf_m', 'iT_m4', 'iL_m4',
  'bmt_m', 'bml_m', 'kmt_m', 'kml_m', 'tpc_t_per_cm', 'mct1cm_tm_per_cm', 'lwl_m', 'bwl_m', 'am_m2',
  'cb', 'cm', 'cp', 'cwp', 'wettedSurface_m2',
];

// Box barge L = 10 m, B = 4 m, depth 2 m; at T = 1 m: volume L B T = 40 m³ and
// TPC = ρ L B / 100 = 1.025 × 40 / 100 = 0.41 t/cm (closed form, e.g. Tupper,
// Introduction to Naval Architecture, ch. 3). Cb = 1 for a box.
const L = 10;
const B = 4;
const DEPTH = 2;
const DENSITY = 1.025;

function barge(name = 'box barge'): { hull: HullModel; result: HydrostaticResult } {
  const hull = { ...boxBarge(L, B, DEPTH), name };
  const rows = hydrostaticTable(prepareHull(hull), [0.5, 1.0], DENSITY);
  return { hull, result: hydrostaticResult(hull, DENSITY, rows) };
}

function parseCsv(text: string): Papa.ParseResult<Record<string, string>> {
  return Papa.parse<Record<string, string>>(text, { header: true, comments: '#', skipEmptyLines: true });
}

describe('hydrostatic CSV', () => {
  test('the headers carry their units and follow the conventions field by field', () => {
    const parsed = parseCsv(hydrostaticsCsv(barge().result));
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual(EXPECTED_HEADERS);
    // Every header with a unit ends with that unit (in its CSV spelling); coefficients have no suffix.
    CONVENTION_FIELDS.forEach(([key, unit], k) => {
      const h = EXPECTED_HEADERS[k]!;
      expect(h.startsWith(key)).toBe(true);
      expect(h === key).toBe(unit === '');
    });
  });

  test('the first line is the caution as a comment, and it stays one cell', () => {
    const text = hydrostaticsCsv(barge().result);
    const first = text.split(/\r\n/)[0]!;
    expect(first).toBe(`# ${CAUTION}`);
    // A spreadsheet that ignores '#' still sees the caution as a single cell.
    const cells = Papa.parse<string[]>(first).data[0]!;
    expect(cells).toHaveLength(1);
  });

  test('the numbers are the closed-form box-barge figures at full precision', () => {
    const rows = parseCsv(hydrostaticsCsv(barge().result)).data;
    expect(rows).toHaveLength(2);
    const atOne = rows[1]!;
    expect(Number(atOne['draft_m'])).toBe(1);
    expect(Number(atOne['volume_m3'])).toBeRelClose(L * B * 1, 1e-12);
    expect(Number(atOne['displacement_t'])).toBeRelClose(DENSITY * L * B * 1, 1e-12);
    expect(Number(atOne['tpc_t_per_cm'])).toBeRelClose((DENSITY * L * B) / 100, 1e-12);
    expect(Number(atOne['cb'])).toBeRelClose(1, 1e-12);
  });

  test('an undefined figure (NaN) is an empty cell, not the text NaN', () => {
    const { result } = barge();
    result.rows[0]!.cp = Number.NaN;
    const text = hydrostaticsCsv(result);
    expect(text).not.toContain('NaN');
    const rows = parseCsv(text).data;
    expect(rows[0]!['cp']).toBe('');
    expect(rows[1]!['cp']).not.toBe('');
  });

  // A text cell that begins with =, +, -, @, a tab or a carriage return may be run as a
  // formula by a spreadsheet: OWASP, "CSV Injection" (community page; from memory).
  test.each(['=1+2', '+1+2', '-1+2', '@SUM(A1:A2)', '\t=1+2', '\r=1+2', 'ok,=1+2', 'ok\r\n=1+2', 'ok\n@x', 'ok;=1+2', 'ok\t=1+2', 'ok;;=1+2', 'ok; \t@x'])(
    'a hull named %j cannot become a formula in the CSV',
    (name) => {
      const text = hydrostaticsCsv(barge(name).result);
      // Read the whole file as a spreadsheet would, comment lines included, with the
      // separators spreadsheets use on import: comma, semicolon (where the decimal mark
      // is a comma) and tab.
      const cells = [',', ';', '\t'].flatMap((delimiter) => Papa.parse<string[]>(text, { delimiter, skipEmptyLines: true }).data.flat());
      for (const cell of cells) {
        // Leading blanks do not hide a formula from every spreadsheet, so they are looked through.
        if (/^\s*[=+\-@]/.test(cell)) {
          // Only a plain number may begin with a sign.
          expect(Number.isFinite(Number(cell)), `cell ${JSON.stringify(cell)}`).toBe(true);
        }
      }
      // The hull line is still there, one line, naming the hull (its last word at least).
      const hullLines = text.split('\r\n').filter((l) => l.startsWith('# hull:'));
      expect(hullLines).toHaveLength(1);
      expect(hullLines[0]).toContain(/[^\s,;]+$/.exec(name)![0]);
    },
  );
});

describe('hydrostatic JSON', () => {
  test('a result has hull, density, caution and rows with the conventions field names', () => {
    const parsed = JSON.parse(toJson(barge().result)) as Record<string, unknown>;
    expect(Object.keys(parsed)).toEqual(['hull', 'density', 'caution', 'rows', 'notes']);
    expect(parsed['caution']).toBe(CAUTION);
    expect(parsed['density']).toBe(DENSITY);
    const rows = parsed['rows'] as Record<string, unknown>[];
    expect(Object.keys(rows[0]!)).toEqual(CONVENTION_FIELDS.map(([k]) => k));
    expect(rows[1]!['volume']).toBeRelClose(L * B * 1, 1e-12);
  });

  test('the hull summary gives the perpendiculars and LBP of the hull', () => {
    const parsed = JSON.parse(toJson(barge().result)) as { hull: Record<string, unknown> };
    // Without ap and fp in the model they are the end stations (conventions, "Perpendiculars").
    expect(parsed.hull).toEqual({ name: 'box barge', stations: 11, waterlines: 5, ap: 0, fp: L, lbp: L });
  });

  test('an undefined figure (NaN) is null, and infinities too', () => {
    const { result } = barge();
    result.rows[0]!.cp = Number.NaN;
    result.rows[0]!.cm = Number.POSITIVE_INFINITY;
    const text = toJson(result);
    expect(text).not.toMatch(/NaN|Infinity/);
    const rows = (JSON.parse(text) as { rows: Record<string, unknown>[] }).rows;
    expect(rows[0]!['cp']).toBeNull();
    expect(rows[0]!['cm']).toBeNull();
    expect(typeof rows[1]!['cp']).toBe('number');
  });
});

/** The lines of a text table from its column heads on (the lines above say what it is of). */
const fromHeads = (text: string): string[] => {
  const lines = text.split('\n');
  return lines.slice(lines.findIndex((l) => l.trim().startsWith('Draft')) - 1);
};

describe('hydrostatic text table', () => {
  test('a units line sits under the column heads', () => {
    const lines = fromHeads(hydrostaticsText(barge().result));
    const heads = lines[1]!.trim().split(/\s+/);
    const units = lines[2]!.trim().split(/\s+/);
    expect(heads[0]).toBe('Draft');
    // Units of the conventions table, in order, for the fields that have one.
    expect(units).toEqual(CONVENTION_FIELDS.filter(([, u]) => u !== '').map(([, u]) => u));
  });

  test('one line per draft, the draft first, and the caution at the end', () => {
    const text = hydrostaticsText(barge().result);
    const lines = fromHeads(text.trimEnd());
    expect(lines[3]!.trim().split(/\s+/)[0]).toBe('0.500');
    expect(lines[4]!.trim().split(/\s+/)[0]).toBe('1.000');
    expect(lines[lines.length - 1]).toBe(CAUTION);
  });

  test('a NaN figure shows as a dash', () => {
    const { result } = barge();
    result.rows[0]!.cp = Number.NaN;
    expect(hydrostaticsText(result)).not.toContain('NaN');
    expect(fromHeads(hydrostaticsText(result))[3]).toMatch(/\s-\s/);
  });
});
