/**
 * The curves of form as SVG: each particular of the hydrostatic table against draft,
 * draft up the side as the trade draws them. The particulars differ in size and unit,
 * so each curve has its own round scale (1, 2, 2.5 or 5 times a power of ten per
 * division of the common horizontal axis of ten divisions), chosen so that its largest
 * value lies within the sheet; the key gives each curve's name, unit, scale and origin,
 * and each curve is labelled at its top end.
 */
import { scaleLinear } from 'd3-scale';
import { curveMonotoneY, line } from 'd3-shape';
import { bottomAxis, leftAxis } from './axes.js';
import { roundStep, short, unitText } from './scaleText.js';
import { curveStroke, el, INK, plotDocument, text } from './svg.js';
import { HYDROSTATIC_FIELDS, type HydrostaticField, type HydrostaticRow } from '../upright/hydrostaticFields.js';

/** The particulars drawn when none are named. */
export const CURVES_OF_FORM_FIELDS: readonly HydrostaticField[] = [
  'displacement', 'lcb', 'vcb', 'lcf', 'waterplaneArea', 'kmt', 'kml', 'tpc', 'mct1cm', 'wettedSurface', 'cb', 'cp', 'cwp',
];

export interface CurvesOfFormData {
  readonly name: string;
  /** t/m³ */
  readonly density: number;
  /** Rows of the hydrostatic table (core/upright/hydrostatics.ts hydrostaticTable), in any order of draft. */
  readonly rows: readonly HydrostaticRow[];
  readonly fields?: readonly HydrostaticField[];
}

/** The scale of one curve: value = origin + division x step. */
export interface CurveScale {
  readonly field: HydrostaticField;
  readonly origin: number;
  readonly step: number;
}

/** Divisions of the common horizontal axis. */
export const DIVISIONS = 10;

/**
 * Origin and step of a curve's values. Coefficients share one scale, 0 to 1 across the
 * sheet, so they can be compared with each other. Otherwise from zero for a quantity
 * that stays within the upper half of its range from zero (sizes), else from a round
 * value below its least (positions such as LCB and LCF, which would otherwise crowd
 * into one division).
 */
export function curveScale(field: HydrostaticField, values: readonly number[]): CurveScale {
  const finite = values.filter(Number.isFinite);
  const lo = Math.min(...finite);
  const hi = Math.max(...finite);
  if (finite.length === 0) return { field, origin: 0, step: 1 };
  if (HYDROSTATIC_FIELDS.find((f) => f.key === field)?.unit === '-' && lo >= 0 && hi <= 1) return { field, origin: 0, step: 1 / DIVISIONS };
  if (lo >= 0 && lo <= 0.5 * hi) return { field, origin: 0, step: roundStep(hi / DIVISIONS) };
  let step = roundStep((hi - lo) / (DIVISIONS - 2) || Math.abs(hi) / DIVISIONS || 1);
  let origin = Math.floor(lo / step) * step;
  while (hi > origin + DIVISIONS * step * (1 + 1e-12)) {
    step = roundStep(step * 1.01);
    origin = Math.floor(lo / step) * step;
  }
  return { field, origin, step };
}

export function curvesOfFormPlot(d: CurvesOfFormData): string {
  const fields = d.fields ?? CURVES_OF_FORM_FIELDS;
  const meta = new Map(HYDROSTATIC_FIELDS.map((f) => [f.key as HydrostaticField, f]));
  const rows = [...d.rows].sort((a, b) => a.draft - b.draft);
  const W = 980;
  const left = 78;
  const right = 24;
  // Room above the plot for the curves' labels, three rows of them.
  const top = 84;
  const plotH = 430;
  const drafts = rows.map((r) => r.draft);
  const sx = scaleLinear().domain([0, DIVISIONS]).range([left, W - right]);
  const sy = scaleLinear().domain([Math.min(...drafts), Math.max(...drafts)]).nice().range([top + plotH, top]);
  const scales = fields.map((f) => curveScale(f, rows.map((r) => r[f])));
  const curves: string[] = [];
  const ends: { x: number; y: number; label: string; i: number }[] = [];
  scales.forEach((s, i) => {
    const pts = rows.filter((r) => Number.isFinite(r[s.field])).map((r): [number, number] => [(r[s.field] - s.origin) / s.step, r.draft]);
    const dpath = line<[number, number]>().x((q) => sx(q[0])).y((q) => sy(q[1])).curve(curveMonotoneY).digits(2)(pts) ?? '';
    curves.push(el('path', { d: dpath, fill: 'none', 'stroke-width': 1.8, ...curveStroke(i), 'data-curve': s.field }));
    const last = pts[pts.length - 1];
    if (last !== undefined) ends.push({ x: sx(last[0]), y: sy(last[1]), label: meta.get(s.field)!.label, i });
  });
  // Labels at the top end of each curve, lifted a row where they would overlap.
  ends.sort((a, b) => a.x - b.x);
  const placed: { x: number; w: number; row: number }[] = [];
  const labels = ends.map((e) => {
    const w = e.label.length * 7 + 6;
    let row = 0;
    while (placed.some((p) => p.row === row && Math.abs(p.x - e.x) < (p.w + w) / 2)) row++;
    placed.push({ x: e.x, w, row });
    return text(e.x, e.y - 6 - 13 * row, e.label, { 'text-anchor': 'middle', 'font-size': 11, 'font-weight': 600, fill: curveStroke(e.i).stroke });
  });
  const axes = [
    bottomAxis(sx, top + plotH + 8, { title: 'scale divisions (each curve\u2019s own scale is in the key below)', ticks: DIVISIONS, gridTo: top, format: (v) => String(v) }),
    leftAxis(sy, left - 8, { title: 'draft, m', ticks: 10, gridTo: W - right }),
  ];
  // The key: one entry per curve with its sample, name, unit and scale, in three columns.
  const keyTop = top + plotH + 66;
  const columns = 3;
  const colW = (W - left - right) / columns;
  const key = scales.map((s, i) => {
    const f = meta.get(s.field)!;
    const unit = unitText(f.unit);
    const per = `1 division = ${short(s.step)}${unit === '' ? '' : ` ${unit}`}`;
    const from = s.origin === 0 ? '' : `, from ${short(s.origin)}${unit === '' ? '' : ` ${unit}`}`;
    const x = left + (i % columns) * colW;
    const y = keyTop + Math.floor(i / columns) * 18;
    return (
      el('line', { x1: x, x2: x + 26, y1: y - 4, y2: y - 4, 'stroke-width': 2, ...curveStroke(i) }) +
      text(x + 32, y, `${f.label}${unit === '' ? ' (coefficient)' : `, ${unit}`}: ${per}${from}`, { 'font-size': 11.5, fill: INK.text, 'data-key': s.field })
    );
  });
  const height = keyTop + Math.ceil(scales.length / columns) * 18 + 6;
  const dmin = short(Math.min(...drafts));
  const dmax = short(Math.max(...drafts));
  const desc =
    `Curves of form of ${d.name} at density ${d.density} t/m³, drafts ${dmin} to ${dmax} m up the side: ` +
    scales.map((s) => `${meta.get(s.field)!.label}, ${meta.get(s.field)!.description} (${unitText(meta.get(s.field)!.unit) || 'no unit'}, 1 division = ${short(s.step)}${s.origin === 0 ? '' : `, from ${short(s.origin)}`})`).join('; ') +
    '. The hydrostatic table gives the same figures as numbers.';
  return plotDocument({
    id: 'hb-curves-of-form',
    width: W,
    height,
    title: `Curves of form: ${d.name}`,
    desc,
    body: [...axes, el('g', { 'data-role': 'curves' }, curves), ...labels, el('g', { 'data-role': 'key' }, key)].join(''),
  });
}
