/**
 * The stability results as answers (core/report/answerForm.ts): the floating position of
 * a load, the cross curves of stability and the righting-lever (GZ) curve of a loading
 * with its criteria. Each result is the conventions' fields plus `hull`, `density` and
 * `caution`; each form says the unit of every number, the table's columns and the lines
 * that say what it is of. The criteria's thresholds and values stay in the units of the
 * rule (m·rad, m, degrees), which each verdict names, whatever the answer's units.
 */
import { CAUTION } from '../common/caution.js';
import type { HullModel } from '../hull/hullModel.js';
import { CRITERIA_NOTES, CRITERION_KINDS } from '../stability/criteria.js';
import type { CrossCurveRow, TrimMode } from '../stability/crossCurves.js';
import type { FloatingPosition } from '../stability/floatingPosition.js';
import type { GzResult } from '../stability/rightingLevers.js';
import type { AnswerForm, FormContext, Row, TableColumn } from './answerForm.js';
import { datumLine, HULL_UNITS, hullSummary, type HullSummary } from './resultParts.js';

interface Answered {
  hull: HullSummary;
  density: number;
  caution: string;
}

function answered(hull: HullModel, density: number): Answered {
  return { hull: hullSummary(hull), density, caution: CAUTION };
}

/** The lines every stability answer starts with: the hull, the density, the datum of x. */
function headLines(r: Answered, ctx: FormContext): string[] {
  const u = ctx.u('m');
  return [
    `hull: ${r.hull.name}`,
    ctx.conv.system === 'si' ? `density: ${r.density} t/m3` : `density: ${r.density} t/m3; units: feet and long tons (1 ft = 0.3048 m; 1 long ton = 1016.0469088 kg)`,
    `${datumLine(r.hull, ctx.n, u)}; heel positive to starboard; trim = draft aft - draft forward, positive by the stern`,
  ];
}

// ---------------------------------------------------------------- floating position

export type FloatResult = Answered & FloatingPosition;

export function floatResult(hull: HullModel, density: number, position: FloatingPosition): FloatResult {
  return { ...answered(hull, density), ...position };
}

const FLOAT_COLUMNS: readonly TableColumn[] = [
  { key: 'displacement', unit: 't', label: 'Displacement' },
  { key: 'lcg', unit: 'm', label: 'LCG' },
  { key: 'tcg', unit: 'm', label: 'TCG' },
  { key: 'kg', unit: 'm', label: 'KG' },
  { key: 'draftAft', unit: 'm', label: 'T aft' },
  { key: 'draftFwd', unit: 'm', label: 'T fwd' },
  { key: 'trim', unit: 'm', label: 'Trim' },
  { key: 'heel', unit: 'deg', label: 'Heel' },
  { key: 'draft', unit: 'm', label: 'T mid' },
  { key: 'lcb', unit: 'm', label: 'LCB' },
  { key: 'tcb', unit: 'm', label: 'TCB' },
  { key: 'vcb', unit: 'm', label: 'VCB' },
  { key: 'gm', unit: 'm', label: 'GM' },
];

export const FLOAT_FORM: AnswerForm<FloatResult> = {
  units: {
    hull: HULL_UNITS,
    ...Object.fromEntries(FLOAT_COLUMNS.map((c) => [c.key, c.unit])),
    residuals: { volume: 'm3', longitudinal: 'm', transverse: 'm' },
    stable: '',
  },
  columns: FLOAT_COLUMNS,
  rows: (r) => [r as unknown as Row],
  lines: (r, ctx) => [
    ...headLines(r, ctx),
    `floating position of the load: B under G${r.kg === null ? ' (no KG given: LCB = LCG, upright)' : ''}; T mid is the draft amidships${r.gm === null ? '' : '; GM is the metacentric height at the balance, the slope of GZ there per radian'}`,
    ...(r.stable === false
      ? [
          `UNSTABLE: GM at this balance is ${brief(r.gm!, ctx)} ${ctx.u('m')}, below zero, so the vessel would not rest here: a small heel grows until it lolls to an angle where GZ is zero again with a rising slope, or capsizes; the gz curve of this loading shows which`,
        ]
      : []),
  ],
  notes: (r, ctx) => [
    `residuals of the balance: volume ${brief(r.residuals.volume, ctx)} ${ctx.u('m3')}; B from G's vertical ${brief(r.residuals.longitudinal, ctx)} ${ctx.u('m')} along and ${brief(r.residuals.transverse, ctx)} ${ctx.u('m')} across`,
  ],
};

// ---------------------------------------------------------------- cross curves

export interface CrossCurvesResult extends Answered {
  trim: TrimMode;
  rows: CrossCurveRow[];
}

export function crossCurvesResult(hull: HullModel, density: number, trim: TrimMode, rows: CrossCurveRow[]): CrossCurvesResult {
  return { ...answered(hull, density), trim, rows };
}

/** The key of the CSV column of KN at a heel: `kn_30deg`. */
export const knKey = (heel: number): string => `kn_${heel}deg`;

/**
 * The cross curves' form for a list of heels (degrees): JSON one row per displacement and
 * heel, as the conventions give them; CSV and text the table a spreadsheet wants, one row
 * per displacement and one KN column per heel.
 */
export function crossCurvesForm(heels: readonly number[]): AnswerForm<CrossCurvesResult> {
  // A heel typed twice (0:10:90,30) is one column, as a displacement typed twice is one
  // row: a table with two columns of one name would not read back.
  const distinct = [...new Set(heels)];
  return {
    units: { hull: HULL_UNITS, rows: [{ displacement: 't', heel: 'deg', kn: 'm', draft: 'm', trim: 'm' }] },
    columns: [{ key: 'displacement', unit: 't', label: 'Displacement' }, ...distinct.map((h) => ({ key: knKey(h), unit: 'm', label: `KN ${h}°` }))],
    rows: (r) => {
      const byDisplacement = new Map<number, Record<string, unknown>>();
      for (const row of r.rows) {
        let wide = byDisplacement.get(row.displacement);
        if (wide === undefined) {
          wide = { displacement: row.displacement };
          byDisplacement.set(row.displacement, wide);
        }
        wide[knKey(row.heel)] = row.kn;
      }
      return [...byDisplacement.values()];
    },
    lines: (r, ctx) => [
      ...headLines(r, ctx),
      `cross curves of stability: KN (${ctx.u('m')}) from K on the centreline to the line of buoyancy, ${r.trim === 'level' ? 'at level trim' : 'free to trim (B kept at the upright LCB of each displacement)'}; one row per displacement (${ctx.u('t')}), one column per heel (degrees)`,
    ],
  };
}

// ---------------------------------------------------------------- righting levers

export interface GzAnswer extends Answered, GzResult {
  /** What every verdict says beside its numbers, and how the curve was worked. */
  notes: string[];
}

export function gzAnswer(hull: HullModel, density: number, result: GzResult): GzAnswer {
  return { ...answered(hull, density), ...result, notes: [...CRITERIA_NOTES] };
}

const GZ_COLUMNS: readonly TableColumn[] = [
  { key: 'heel', unit: 'deg', label: 'Heel' },
  { key: 'gz', unit: 'm', label: 'GZ' },
  { key: 'area', unit: 'm.rad', label: 'Area to heel' },
];

const CRITERION_WHAT = new Map<string, string>(CRITERION_KINDS.map((k) => [k.id, k.what]));

/** A figure in a line of words: four significant digits (a millimetre in metres), fewer if the answer asks for fewer. */
function brief(v: number, ctx: FormContext): string {
  return Number.isFinite(v) ? ctx.n(Number(v.toPrecision(Math.min(4, ctx.options.digits)))) : '-';
}

/** A verdict in words: `area-0-30 (...): required 0.055 m.rad; actual 0.081 m.rad; pass`. */
function verdictLine(c: GzResult['criteria'][number], ctx: FormContext): string {
  return `criterion ${c.id} (${CRITERION_WHAT.get(c.id) ?? c.id}): required at least ${ctx.n(c.required)} ${c.unit}; actual ${brief(c.actual, ctx)} ${c.unit}: ${c.pass ? 'pass' : 'FAIL'}`;
}

const angle = (v: number | null, none: string): string => (v === null ? none : `${Number(v.toFixed(2))} deg`);

export const GZ_FORM: AnswerForm<GzAnswer> = {
  units: {
    hull: HULL_UNITS,
    displacement: 't',
    kg: 'm',
    fsm: 't.m',
    kgEffective: 'm',
    gm0: 'm',
    points: [{ heel: 'deg', gz: 'm' }],
    areas: [{ heel: 'deg', area: 'm.rad' }],
    maxGz: 'm',
    angleOfMaxGz: 'deg',
    vanishingAngle: 'deg',
    lollAngle: 'deg',
    downfloodingAngle: 'deg',
  },
  columns: GZ_COLUMNS,
  rows: (r) => r.points.map((p, k) => ({ heel: p.heel, gz: p.gz, area: r.areas[k]?.area ?? null })),
  lines: (r, ctx) => {
    const m = ctx.u('m');
    const b = (v: number): string => brief(v, ctx);
    const passed = r.criteria.filter((c) => c.pass).length;
    return [
      ...headLines(r, ctx),
      `loading: displacement ${ctx.n(r.displacement)} ${ctx.u('t')}; KG ${ctx.n(r.kg)} ${m}; free surface moment ${ctx.n(r.fsm)} ${ctx.u('t.m')}, so KG + FSM / displacement = ${b(r.kgEffective)} ${m}; ${r.trim === 'free' ? 'free to trim as it heels' : 'at level trim'}`,
      `GM0 ${b(r.gm0)} ${m}; ${r.maxGz > 0 ? `largest GZ ${b(r.maxGz)} ${m} at ${angle(r.angleOfMaxGz, '-')}` : `no GZ above zero (its largest, ${b(r.maxGz)} ${m}, at ${angle(r.angleOfMaxGz, '-')})`}; angle of vanishing stability ${angle(r.vanishingAngle, 'beyond 180 deg')}; downflooding angle ${angle(r.downfloodingAngle, 'none (no opening given, or none reaches the water)')}`,
      ...(r.gm0 < 0
        ? [
            r.lollAngle === null
              ? `GM0 is below zero and GZ does not come back above zero: a vessel so loaded does not stay upright and finds no angle of loll within the curve worked`
              : `GM0 is below zero: a vessel so loaded does not stay upright but lolls to ${angle(r.lollAngle, '-')}, where GZ rises through zero, to either side`,
          ]
        : []),
      `criteria: ${r.criteriaSet.name} (${r.criteriaSet.source}): ${passed} of ${r.criteria.length} met`,
      ...r.criteria.map((c) => verdictLine(c, ctx)),
    ];
  },
  notes: (r) => r.notes,
};
