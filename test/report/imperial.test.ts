/**
 * Imperial output (core/report/imperial.ts, through the shared output step of
 * core/report/answerForm.ts and the hydrostatic table's form).
 *
 * Sources (outside the project):
 * - 1 ft = 0.3048 m and 1 lb = 0.45359237 kg exactly: the international yard and pound
 *   agreement of 1959; 1 long ton = 2240 lb = 1016.0469088 kg (from memory).
 * - TPI = Aw / (12 x ft3 per long ton) and MTI = displacement x BML / (12 x LBP) in long
 *   tons and feet; sea water taken as about 35 ft3 per long ton, so TPI ≈ Aw / 420
 *   (common practice, no source; from memory).
 * The check of the conversion: the same hull written in feet-inches-eighths and in
 * metres, and its particulars computed a third way, natively in feet with the imperial
 * formulae above and the factors written here as literals (not through mathjs).
 */
import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { errorEstimates } from '../../core/upright/errorEstimate.js';
import type { HullModel } from '../../core/hull/hullModel.js';
import { hydrostaticsAt, hydrostaticTable } from '../../core/upright/hydrostatics.js';
import { writeAnswer } from '../../core/report/answerForm.js';
import { ESTIMATED_FORM, estimatedResult, HYDROSTATICS_FORM, hydrostaticResult } from '../../core/report/formatHydrostatics.js';
import { cubicFeetPerLongTon, IMPERIAL_CONVERTER, IMPERIAL_FACTORS, imperialRow } from '../../core/report/imperial.js';
import { DEFAULT_OUTPUT } from '../../core/report/outputOptions.js';
import { SI_CONVERTER } from '../../core/report/unitConversion.js';
import type { ErrorEstimates } from '../../core/upright/errorEstimate.js';
import type { HydrostaticRow } from '../../core/upright/hydrostaticFields.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { gridHull, linspace } from '../fixtures/hulls.js';
import '../helpers/relClose.js';

const FOOT = 0.3048; // m, exact (1959)
const LONG_TON = 2240 * 0.45359237; // kg, exact (1959): 1016.0469088

describe('the conversion factors', () => {
  test('are the exact ones of the 1959 agreement', () => {
    expect(IMPERIAL_FACTORS.metresPerFoot).toBe(FOOT);
    expect(IMPERIAL_FACTORS.tonnesPerLongTon).toBeRelClose(1.0160469088, 1e-15);
    expect(IMPERIAL_FACTORS.cmPerInch).toBeRelClose(2.54, 1e-15);
  });

  test('give sea water about 35 cubic feet per long ton', () => {
    // 1016.0469088 kg / 1025 kg/m3 = 0.99126 m3 = 35.006 ft3.
    expect(cubicFeetPerLongTon(1.025)).toBeRelClose(35.006, 1e-4);
  });
});

// A launch whose offsets are whole sixteenths of an inch, so the feet-inches-eighths file
// and the metric one (k/192 ft = k x 0.0015875 m, written exactly) describe one hull.
const SIXTEENTHS = 192;
const xsFt = linspace(0, 30, 11); // stations every 3 ft
const zsFt = [0, 0.5, 1, 1.5, 2, 2.5, 3];
const sixteenths = (x: number, z: number): number => {
  const xi = (2 * x) / 30 - 1;
  const y = 5 * (1 - xi * xi) * (0.35 + 0.65 * Math.sin((Math.PI / 2) * (z / 3))) + 0.2;
  return Math.round(y * SIXTEENTHS);
};
const ftIn8 = (k: number): string => {
  const ft = Math.floor(k / SIXTEENTHS);
  const rest = k - ft * SIXTEENTHS;
  const inches = Math.floor(rest / 16);
  const s = rest - inches * 16;
  return `${ft}-${inches}-${s >> 1}${s & 1 ? '+' : ''}`;
};
const metres = (k: number): string => ((k * 15875) / 1e7).toFixed(7);
const table = (units: string, cell: (k: number) => string): string =>
  [
    '# name: sixteenths launch',
    `# units: ${units}`,
    `x,${zsFt.map((z) => cell(z * SIXTEENTHS)).join(',')}`,
    ...xsFt.map((x) => `${cell(x * SIXTEENTHS)},${zsFt.map((z) => cell(sixteenths(x, z))).join(',')}`),
  ].join('\n');

describe('imperial particulars', () => {
  const fromFtIn = readOffsetsCsv(table('ft-in-8', ftIn8)).hull;
  const fromMetres = readOffsetsCsv(table('m', metres)).hull;
  const draftFt = 2.25;
  const draft = draftFt * FOOT;
  const density = 1.025;

  test('a feet-inches-eighths table and its metric twin read as the same hull', () => {
    fromFtIn.stations.forEach((s, i) => {
      expect(s.x).toBeRelClose(fromMetres.stations[i]!.x, 1e-14, 1e-15);
      s.points.forEach((q, j) => {
        expect(q.y).toBeRelClose(fromMetres.stations[i]!.points[j]!.y, 1e-14);
        expect(q.z).toBeRelClose(fromMetres.stations[i]!.points[j]!.z, 1e-14, 1e-15);
      });
    });
  });

  test('both give the same particulars in feet and long tons', () => {
    const a = imperialRow(hydrostaticsAt(prepareHull(fromFtIn), draft, density));
    const b = imperialRow(hydrostaticsAt(prepareHull(fromMetres), draft, density));
    for (const k of Object.keys(b)) expect(a[k], k).toBeRelClose(b[k]!, 1e-12, 1e-12);
  });

  test('they agree with the same hull computed natively in feet with the imperial formulae', () => {
    // The hull in feet, treated as plain lengths: volumes come out in ft3, areas in ft2.
    const feet: HullModel = {
      name: 'in feet',
      stations: xsFt.map((x) => ({ x, points: zsFt.map((z) => ({ y: sixteenths(x, z) / SIXTEENTHS, z, knuckle: false })) })),
    };
    const f = hydrostaticsAt(prepareHull(feet), draftFt, density);
    const ft3PerLT = LONG_TON / (density * 1000) / FOOT ** 3;
    const displacementLT = f.volume / ft3PerLT;
    const lbpFt = 30;
    const imp = imperialRow(hydrostaticsAt(prepareHull(fromMetres), draft, density));
    const expected: Record<string, number> = {
      draft: draftFt,
      volume: f.volume,
      displacement: displacementLT,
      lcb: f.lcb,
      vcb: f.vcb,
      waterplaneArea: f.waterplaneArea,
      lcf: f.lcf,
      iT: f.iT,
      iL: f.iL,
      bmt: f.bmt,
      kml: f.kml,
      tpi: f.waterplaneArea / (12 * ft3PerLT),
      mti: (displacementLT * f.bml) / (12 * lbpFt),
      lwl: f.lwl,
      wettedSurface: f.wettedSurface,
      cb: f.cb,
      cp: f.cp,
    };
    for (const k of Object.keys(expected)) expect(imp[k], k).toBeRelClose(expected[k]!, 1e-12);
    // And the trade's rule of thumb for sea water: TPI ≈ Aw / 420.
    expect(imp['tpi']).toBeRelClose(f.waterplaneArea / 420, 1e-3);
  });
});

type Units = 'si' | 'imperial';
interface Report {
  caution: string;
  hull: { lbp: number };
  fields: { key: string; unit: string }[];
  rows: Record<string, number | Record<string, number>>[];
  errorNotes?: string[];
}

/** The table in a form and unit system, as the command line and the service write it (digits 17: every digit of the conversion). */
function written(format: 'json' | 'csv' | 'table', hull: HullModel, rows: HydrostaticRow[], units: Units, est?: ErrorEstimates): string {
  const conv = units === 'si' ? SI_CONVERTER : IMPERIAL_CONVERTER;
  const options = { ...DEFAULT_OUTPUT, units, digits: 17 };
  return est === undefined
    ? writeAnswer(HYDROSTATICS_FORM, hydrostaticResult(hull, 1.025, rows, conv), format, options, conv)
    : writeAnswer(ESTIMATED_FORM, estimatedResult(hull, 1.025, rows, est, conv), format, options, conv);
}
const hydrostaticsReport = (hull: HullModel, _d: number, rows: HydrostaticRow[], o: { units: Units; errorEstimate?: ErrorEstimates }): Report =>
  JSON.parse(written('json', hull, rows, o.units, o.errorEstimate)) as Report;

describe('the report in imperial units', () => {
  const hull = readOffsetsCsv(table('ft-in-8', ftIn8)).hull;
  const p = prepareHull(hull);
  const drafts = [1.5 * FOOT, 2.5 * FOOT];
  const rows = hydrostaticTable(p, drafts, 1.025);

  test('JSON rows are in feet and long tons, with TPI and MTI, and the hull in feet', () => {
    const r = hydrostaticsReport(hull, 1.025, rows, { units: 'imperial' });
    expect(r.caution).toBe(CAUTION);
    expect(r.rows[0]!['draft']).toBeRelClose(1.5, 1e-14);
    expect(r.hull.lbp).toBeRelClose(30, 1e-14);
    expect(r.fields.map((f) => f.key)).toContain('tpi');
    expect(r.fields.find((f) => f.key === 'mti')!.unit).toBe('LT.ft/in');
    expect(r.rows[1]!['volume']).toBeRelClose(rows[1]!.volume / FOOT ** 3, 1e-14);
  });

  test('CSV headers carry the imperial units after the caution line', () => {
    const csv = written('csv', hull, rows, 'imperial');
    expect(csv.split('\r\n')[0]).toBe(`# ${CAUTION}`);
    const data = Papa.parse<string[]>(csv.split('\r\n').filter((l) => !l.startsWith('#')).join('\n'), { skipEmptyLines: true }).data;
    expect(data[0]).toEqual(expect.arrayContaining(['draft_ft', 'volume_ft3', 'displacement_LT', 'iT_ft4', 'tpi_LT_per_in', 'mti_LTft_per_in', 'cb']));
    expect(data).toHaveLength(3);
  });

  test('error estimates are converted with their quantity and shown beside it', () => {
    // A smooth hull, fine enough that every estimate is given (a sine hull: half-breadth
    // (1 + 0.3 xi) cos(pi xi / 2) sin(pi z / 6) x 3 m, 25 stations, 17 waterlines).
    const smooth = gridHull('sine hull', linspace(0, 24, 25), linspace(0, 3, 17), (x, z) => {
      const xi = x / 12 - 1;
      return 3 * (1 + 0.3 * xi) * Math.cos((Math.PI * xi) / 2) * Math.sin((Math.PI * z) / 6);
    });
    const sp = prepareHull(smooth);
    const smoothRows = hydrostaticTable(sp, [1.5]);
    const est = errorEstimates(sp, [1.5], 1.025);
    expect(est.unreliable[0]).toEqual([]);
    const si = hydrostaticsReport(smooth, 1.025, smoothRows, { units: 'si', errorEstimate: est });
    const imp = hydrostaticsReport(smooth, 1.025, smoothRows, { units: 'imperial', errorEstimate: est });
    const siE = si.rows[0]!['errorEstimate'] as Record<string, number>;
    const impE = imp.rows[0]!['errorEstimate'] as Record<string, number>;
    expect(siE['volume']).toBe(est.estimates[0]!.volume);
    expect(impE['volume']).toBeRelClose(siE['volume']! / FOOT ** 3, 1e-14);
    expect(impE['lcb']).toBeRelClose(siE['lcb']! / FOOT, 1e-14);
    const text = written('table', smooth, smoothRows, 'imperial', est);
    expect(text).toContain('err Volume');
    expect(text).toContain('TPI');
    expect(text.trimEnd().endsWith(CAUTION)).toBe(true);
    const csv = written('csv', smooth, smoothRows, 'si', est);
    expect(csv).toContain('volumeError_m3');
    expect(csv).toContain('# error estimates: exact minus computed');
  });

  test('an estimate that cannot be trusted is not given, and the report says why', () => {
    // The launch's 11 stations leave a third level of 3 stations and 2 waterlines, which
    // cannot confirm the h^4 law for its volume at the lightest draft.
    const est = errorEstimates(p, drafts, 1.025);
    const si = hydrostaticsReport(hull, 1.025, rows, { units: 'si', errorEstimate: est });
    expect((si.rows[0]!['errorEstimate'] as Record<string, number | null>)['volume']).toBeNull();
    expect(si.errorNotes![0]).toMatch(/^draft 0\.4572 m: volume: halving twice gives a ratio of .* not about 16/);
    expect(written('csv', hull, rows, 'si', est)).toContain('# error estimate not given at draft 0.4572 m: volume: halving twice');
  });
});
