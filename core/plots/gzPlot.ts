/**
 * The righting-lever (GZ) curve of a loading as SVG, with what a reader checks on it:
 * GM0 drawn as the slope of the curve at the origin (the tangent reaches GM0 at one
 * radian, 57.3°, where a vertical of height GM0 meets it), the largest GZ and its
 * angle, the angle of vanishing stability, the angle of loll where GM0 is below zero,
 * the downflooding angle, the areas of the criteria shaded (0° to 30°, and 30° to 40° or
 * the downflooding angle if less), and the criteria table with each verdict written in
 * words as well as shown in colour.
 *
 * GZ ≈ GM0 · φ near upright (φ in radians), so the tangent at the origin has slope GM0
 * per radian: common practice, e.g. E. C. Tupper, Introduction to Naval Architecture,
 * 5th ed. (2013), ch. 4 (from memory).
 */
import { area, curveMonotoneX, line } from 'd3-shape';
import { xyFrame } from './axes.js';
import { short, unitText } from './scaleText.js';
import { el, INK, plotDocument, text } from './svg.js';
import type { CriterionVerdict as CriterionResult, GzCurve as GzResult } from './stabilityShapes.js';

/** One radian, in degrees: where the tangent at the origin reaches GM0. */
export const RADIAN_DEG = 180 / Math.PI;

const CRITERION_WORDS: Record<string, string> = {
  'area-0-30': 'area under the GZ curve, 0° to 30°',
  'area-0-40': 'area under the GZ curve, 0° to 40° or downflooding',
  'area-30-40': 'area under the GZ curve, 30° to 40° or downflooding',
  'gz-at-30': 'GZ at 30° or more',
  'angle-of-max-gz': 'angle of the largest GZ',
  gm0: 'initial metacentric height GM0',
};

/** A criterion in words: its name, what is required and what there is, and the verdict. */
export function criterionWords(c: CriterionResult): string {
  const unit = c.unit === 'deg' || c.unit === 'degrees' ? '°' : ` ${unitText(c.unit)}`;
  return `${CRITERION_WORDS[c.id] ?? c.id}: at least ${short(c.required)}${unit} required, ${short(c.actual)}${unit} found: ${c.pass ? 'pass' : 'FAIL'}`;
}

export interface GzPlotData {
  readonly name: string;
  readonly result: GzResult;
  /** The loading, said in the title when given. */
  readonly displacement?: number;
  readonly kg?: number;
}

const AREA_0_30 = '#56B4E9';
const AREA_30_40 = '#009E73';

export function gzPlot(d: GzPlotData): string {
  const r = d.result;
  const W = 980;
  const pts = [...r.points].sort((a, b) => a.heel - b.heel).map((p): [number, number] => [p.heel, p.gz]);
  const heels = pts.map((p) => p[0]);
  const gzs = pts.map((p) => p[1]);
  const df = r.downfloodingAngle ?? null;
  const f = xyFrame({
    width: W,
    plotHeight: 360,
    x: [Math.min(0, ...heels), Math.max(60, ...heels)],
    y: [Math.min(0, ...gzs, r.gm0), Math.max(0, ...gzs, r.gm0) * 1.08 || 0.1],
    xAxis: { title: 'angle of heel, degrees', ticks: 12 },
    yAxis: { title: 'righting lever GZ, m', ticks: 8 },
  });
  const x0 = f.sx(0);
  const y0 = f.sy(0);
  const under = area<[number, number]>().x((q) => f.sx(q[0])).y0(y0).y1((q) => f.sy(q[1])).curve(curveMonotoneX).digits(2)(pts) ?? '';
  const top40 = df === null ? 40 : Math.min(40, df);
  const clip = (id: string, a: number, b: number): string => el('clipPath', { id }, el('rect', { x: f.sx(a), y: f.top, width: Math.max(0, f.sx(b) - f.sx(a)), height: f.bottom - f.top }));
  const defs = el('defs', {}, [
    clip('hb-gz-clip-0-30', 0, 30),
    clip('hb-gz-clip-30-40', 30, top40),
    el('pattern', { id: 'hb-gz-hatch', patternUnits: 'userSpaceOnUse', width: 7, height: 7, patternTransform: 'rotate(45)' }, el('line', { x1: 0, y1: 0, x2: 0, y2: 7, stroke: AREA_30_40, 'stroke-width': 2.4 })),
  ]);
  const shading = [
    el('path', { d: under, fill: AREA_0_30, 'fill-opacity': 0.35, 'clip-path': 'url(#hb-gz-clip-0-30)', 'data-role': 'area-0-30' }),
    top40 > 30 ? el('path', { d: under, fill: 'url(#hb-gz-hatch)', 'clip-path': 'url(#hb-gz-clip-30-40)', 'data-role': 'area-30-40' }) : '',
  ];
  const gzPath = line<[number, number]>().x((q) => f.sx(q[0])).y((q) => f.sy(q[1])).curve(curveMonotoneX).digits(2)(pts) ?? '';
  const marks: string[] = [];
  // GM0: the tangent at the origin meets the vertical at one radian at height GM0.
  const xr = f.sx(RADIAN_DEG);
  marks.push(el('line', { x1: x0, y1: y0, x2: xr, y2: f.sy(r.gm0), stroke: '#CC79A7', 'stroke-width': 1.6, 'stroke-dasharray': '7 3', 'data-role': 'gm0-tangent' }));
  marks.push(el('line', { x1: xr, y1: y0, x2: xr, y2: f.sy(r.gm0), stroke: '#CC79A7', 'stroke-width': 1.6, 'data-role': 'radian' }));
  // The label beside the vertical, on its left where the plot ends close to the right of it.
  const gmLabel = `GM0 = ${short(r.gm0)} m at 57.3° (1 rad)`;
  const roomRight = f.right - xr > gmLabel.length * 6.6;
  marks.push(text(roomRight ? xr + 5 : xr - 5, (y0 + f.sy(r.gm0)) / 2, gmLabel, { 'font-size': 11.5, fill: '#A8397F', 'font-weight': 600, 'text-anchor': roomRight ? 'start' : 'end' }));
  if (Number.isFinite(r.maxGz)) {
    const cx = f.sx(r.angleOfMaxGz);
    const cy = f.sy(r.maxGz);
    marks.push(el('circle', { cx, cy, r: 4.5, fill: '#D55E00', 'data-role': 'max-gz' }));
    // Centred over the mark, or from it inward near either end, so the words stay inside the figure.
    const anchor = cx < f.left + 0.2 * (f.right - f.left) ? 'start' : cx > f.right - 0.2 * (f.right - f.left) ? 'end' : 'middle';
    marks.push(text(anchor === 'start' ? cx - 6 : anchor === 'end' ? cx + 6 : cx, cy - 10, `largest GZ ${short(r.maxGz)} m at ${short(r.angleOfMaxGz)}°`, { 'text-anchor': anchor, 'font-size': 11.5, fill: '#A8400A', 'font-weight': 600 }));
  }
  const loll = r.lollAngle ?? null;
  if (loll !== null && Number.isFinite(loll)) {
    // Above the zero line and left of the mark: the curve is below the line there (GZ is
    // negative up to the angle of loll), so the words never cross it.
    const lx = f.sx(loll);
    marks.push(el('circle', { cx: lx, cy: y0, r: 4, fill: 'none', stroke: INK.text, 'stroke-width': 1.5, 'data-role': 'loll' }));
    marks.push(text(lx - 7, y0 - 8, `angle of loll ${short(loll)}°`, { 'text-anchor': 'end', 'font-size': 11, fill: INK.text }));
  }
  const vanishing = r.vanishingAngle ?? null;
  if (vanishing !== null && Number.isFinite(vanishing)) {
    const vx = f.sx(vanishing);
    marks.push(el('path', { d: `M${vx},${y0}l-5,9h10z`, fill: INK.text, 'data-role': 'vanishing' }));
    // Under the mark, clear of the curve (which crosses the zero line there) and of a
    // downflooding line just before it; kept inside the figure near its right edge.
    marks.push(text(Math.min(vx, W - 44), y0 + 24, `vanishing ${short(vanishing)}°`, { 'text-anchor': 'middle', 'font-size': 11, fill: INK.text }));
  }
  if (df !== null && Number.isFinite(df)) {
    marks.push(el('line', { x1: f.sx(df), x2: f.sx(df), y1: f.bottom, y2: f.top, stroke: '#0072B2', 'stroke-width': 1.8, 'stroke-dasharray': '3 3', 'data-role': 'downflooding' }));
    // Beside the line on the side with room: to the left in the right half of the plot, so
    // the words stay inside the figure.
    const leftOfLine = f.sx(df) > (f.left + f.right) / 2;
    marks.push(text(f.sx(df) + (leftOfLine ? -5 : 5), f.top + 14, `downflooding ${short(df)}°`, { 'text-anchor': leftOfLine ? 'end' : 'start', 'font-size': 11.5, fill: '#0072B2', 'font-weight': 600 }));
  }
  // The criteria: one line each, verdict in words and in colour, then the overall verdict.
  const rows: string[] = [];
  let y = f.bottom + 62;
  const failed = r.criteria.filter((c) => !c.pass);
  const verdict =
    r.criteria.length === 0
      ? 'No criteria were checked.'
      : failed.length === 0
        ? `All ${r.criteria.length} criteria pass.`
        : // One is named in the heading; more would run past its line, and are marked below.
          failed.length === 1
          ? `${failed.length} of ${r.criteria.length} criteria FAIL: ${failed.map((c) => CRITERION_WORDS[c.id] ?? c.id).join('; ')}.`
          : `${failed.length} of ${r.criteria.length} criteria FAIL, each marked below.`;
  rows.push(text(f.left, y, verdict, { 'font-size': 13, 'font-weight': 700, fill: failed.length === 0 ? INK.pass : INK.fail, 'data-role': 'verdict' }));
  for (const c of r.criteria) {
    y += 17;
    rows.push(
      el('g', { 'data-criterion': c.id, 'data-pass': String(c.pass) }, [
        text(f.left, y, c.pass ? '✓ pass' : '✗ FAIL', { 'font-size': 12, 'font-weight': 700, fill: c.pass ? INK.pass : INK.fail }),
        text(f.left + 64, y, criterionWords(c), { 'font-size': 12, fill: INK.text }),
      ]),
    );
  }
  y += 18;
  rows.push(text(f.left, y, 'Shaded: the area from 0° to 30° (plain) and from 30° to 40° or downflooding (hatched). The weather criterion is not checked here; other rules may apply.', { 'font-size': 11, fill: INK.axis }));
  const loading = d.displacement !== undefined && d.kg !== undefined ? ` at ${short(d.displacement)} t, KG ${short(d.kg)} m` : '';
  const desc =
    `Righting levers of ${d.name}${loading} against heel from ${short(Math.min(...heels))}° to ${short(Math.max(...heels))}°. GM0 ${short(r.gm0)} m, ` +
    `drawn as the tangent at the origin reaching GM0 at 57.3°. Largest GZ ${short(r.maxGz)} m at ${short(r.angleOfMaxGz)}°` +
    (vanishing !== null ? `; vanishing stability at ${short(vanishing)}°` : '') +
    (df !== null ? `; downflooding at ${short(df)}°` : '') +
    `. ${verdict} ${r.criteria.map(criterionWords).join('. ')}${r.criteria.length > 0 ? '.' : ''}`;
  return plotDocument({
    id: 'hb-gz',
    width: W,
    height: y + 14,
    title: `Righting levers (GZ)${loading}: ${d.name}`,
    desc,
    body: [defs, f.axes, ...shading, el('path', { d: gzPath, fill: 'none', stroke: INK.text, 'stroke-width': 2.2, 'data-curve': 'gz' }), ...marks, ...rows].join(''),
  });
}
