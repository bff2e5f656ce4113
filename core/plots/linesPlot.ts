/**
 * The lines drawing as SVG: the profile (keel, deck edge, stations and waterlines seen
 * from the side), the half-breadth plan below it (the waterlines seen from above) and
 * the body plan beside it (the sections seen from ahead, sections aft of amidships to
 * the left of the centreline and forward of it to the right, as the trade draws them).
 * All three views are at one true scale in both directions, so the hull's shape is not
 * distorted. The offsets are dots, knuckles squares, and offsets the fairness check
 * reports are ringed and numbered, with the list under the drawing.
 */
import { scaleLinear } from 'd3-scale';
import { curveLinear, curveMonotoneX, line, type CurveFactory } from 'd3-shape';
import { bottomAxis, leftAxis, type Linear } from './axes.js';
import { legendRows } from './legend.js';
import type { LinesData } from './linesData.js';
import { el, INK, plotDocument, text, wrapWords } from './svg.js';

const AFT = '#0072B2';
const FWD = '#009E73';
const KNUCKLE = '#CC79A7';

type XY = readonly [number, number];

function path(points: readonly XY[], sx: Linear, sy: Linear, curve: CurveFactory, attrs: Record<string, string | number | undefined>): string {
  const d = line<XY>()
    .x((q) => sx(q[0]))
    .y((q) => sy(q[1]))
    .curve(curve)
    .digits(2)(points as XY[]);
  return el('path', { d: d ?? '', fill: 'none', ...attrs });
}

const dot = (cx: number, cy: number): string => el('circle', { cx, cy, r: 1.9, fill: INK.text });
const knuckleMark = (cx: number, cy: number): string => el('rect', { x: cx - 3, y: cy - 3, width: 6, height: 6, fill: 'none', stroke: KNUCKLE, 'stroke-width': 1.6 });
const ring = (cx: number, cy: number): string => el('circle', { cx, cy, r: 7, fill: 'none', stroke: INK.warn, 'stroke-width': 2 });

export interface LinesPlotOptions {
  /** Width of the drawing, px (980 by default). */
  readonly width?: number;
}

export function linesPlot(d: LinesData, o: LinesPlotOptions = {}): string {
  const W = o.width ?? 980;
  const left = 70;
  const right = 24;
  const gap = 64;
  const xs = [...d.stations.map((s) => s.x), d.ap, d.fp];
  const xmin = Math.min(...xs);
  const xmax = Math.max(...xs);
  const bmax = Math.max(1e-9, ...d.stations.flatMap((s) => [...s.offsets.map((q) => q.y), ...s.curve.map((q) => q[0])]));
  const zmin = Math.min(0, ...d.stations.map((s) => s.keel));
  const zmax = Math.max(...d.stations.map((s) => s.deck));
  const length = Math.max(xmax - xmin, 1e-9);
  const depth = Math.max(zmax - zmin, 1e-9);
  // One scale (px per m) for all three views, limited so that a short, deep hull stays on the sheet.
  const k = Math.min((W - left - right - gap) / (length + 2 * bmax), 420 / (depth + bmax));
  const top = 78;
  const profileBottom = top + k * depth;
  const planTop = profileBottom + 34;
  const planBottom = planTop + k * bmax;
  const sx = scaleLinear().domain([xmin, xmax]).range([left, left + k * length]);
  const sz = scaleLinear().domain([zmin, zmax]).range([profileBottom, top]);
  const sy = scaleLinear().domain([0, bmax]).range([planBottom, planTop]);
  const bodyLeft = left + k * length + gap;
  const sb = scaleLinear().domain([-bmax, bmax]).range([bodyLeft, bodyLeft + 2 * k * bmax]);
  const eps = 1e-9 * Math.max(1, Math.abs(length));
  const side = (x: number): number[] => (x < d.amidships - eps ? [-1] : x > d.amidships + eps ? [1] : [-1, 1]);
  const wlHeights = new Set(d.waterlines.map((w) => w.z));

  const grid: string[] = [];
  const curves: string[] = [];
  const marks: string[] = [];
  const labels: string[] = [];

  // Profile: stations and waterlines as thin lines, keel and deck edge, perpendiculars.
  for (const s of d.stations) grid.push(el('line', { x1: sx(s.x), x2: sx(s.x), y1: sz(s.keel), y2: sz(s.deck), stroke: INK.grid }));
  for (const w of d.waterlines) {
    grid.push(el('line', { x1: sx(xmin), x2: sx(xmax), y1: sz(w.z), y2: sz(w.z), stroke: INK.grid, 'stroke-dasharray': '4 3' }));
    grid.push(el('line', { x1: sb(-bmax), x2: sb(bmax), y1: sz(w.z), y2: sz(w.z), stroke: INK.grid, 'stroke-dasharray': '4 3' }));
  }
  if (zmin <= 0) grid.push(el('line', { x1: sx(xmin), x2: sx(xmax), y1: sz(0), y2: sz(0), stroke: INK.faint }));
  for (const [x, name] of [[d.ap, 'AP'], [d.fp, 'FP']] as const) {
    grid.push(el('line', { x1: sx(x), x2: sx(x), y1: top - 6, y2: profileBottom + 6, stroke: INK.faint, 'stroke-dasharray': '1 3' }));
    labels.push(text(sx(x), top - 10, name, { 'text-anchor': 'middle', 'font-size': 11, fill: INK.axis }));
  }
  labels.push(text(sx(d.amidships), top - 10, 'amidships', { 'text-anchor': 'middle', 'font-size': 11, fill: INK.axis }));
  grid.push(el('line', { x1: sx(d.amidships), x2: sx(d.amidships), y1: top - 6, y2: planBottom, stroke: INK.faint, 'stroke-dasharray': '1 3' }));
  const keel = d.stations.map((s): XY => [s.x, s.keel]);
  const deck = d.stations.map((s): XY => [s.x, s.deck]);
  curves.push(path(keel, sx, sz, curveLinear, { stroke: INK.text, 'stroke-width': 1.8, 'data-curve': 'keel' }));
  curves.push(path(deck, sx, sz, curveMonotoneX, { stroke: INK.text, 'stroke-width': 1.8, 'data-curve': 'deck edge' }));

  // Half-breadth plan: centreline, stations, waterlines, deck edge.
  grid.push(el('line', { x1: sx(xmin), x2: sx(xmax), y1: sy(0), y2: sy(0), stroke: INK.faint }));
  for (const s of d.stations) grid.push(el('line', { x1: sx(s.x), x2: sx(s.x), y1: sy(0), y2: sy(bmax), stroke: INK.grid }));
  d.waterlines.forEach((w) => {
    for (const run of w.runs) {
      if (run.length > 1) curves.push(path(run, sx, sy, curveMonotoneX, { stroke: AFT, 'stroke-width': 1.1, 'data-curve': `waterline ${w.z}` }));
    }
  });
  curves.push(path(d.stations.map((s): XY => [s.x, s.deckY]), sx, sy, curveMonotoneX, { stroke: INK.text, 'stroke-width': 1.8, 'data-curve': 'deck edge in plan' }));

  // Knuckle lines in profile and plan.
  d.knuckleLines.forEach((kl, n) => {
    const attrs = { stroke: KNUCKLE, 'stroke-width': 1.5, 'stroke-dasharray': '6 3' };
    curves.push(path(kl.map((q): XY => [q[0], q[2]]), sx, sz, curveMonotoneX, { ...attrs, 'data-curve': `knuckle line ${n + 1} in profile` }));
    curves.push(path(kl.map((q): XY => [q[0], q[1]]), sx, sy, curveMonotoneX, { ...attrs, 'data-curve': `knuckle line ${n + 1} in plan` }));
  });

  // Body plan: centreline, then each section on its side, with its offsets.
  grid.push(el('line', { x1: sb(0), x2: sb(0), y1: sz(zmin), y2: sz(zmax) - 4, stroke: INK.faint }));
  if (zmin <= 0) grid.push(el('line', { x1: sb(-bmax), x2: sb(bmax), y1: sz(0), y2: sz(0), stroke: INK.faint }));
  labels.push(text(sb(-bmax / 2), top - 10, 'aft', { 'text-anchor': 'middle', 'font-size': 11, fill: AFT }));
  labels.push(text(sb(bmax / 2), top - 10, 'forward', { 'text-anchor': 'middle', 'font-size': 11, fill: FWD }));
  for (const s of d.stations) {
    for (const sign of side(s.x)) {
      const colour = sign < 0 ? AFT : FWD;
      curves.push(path(s.curve.map((q): XY => [sign * q[0], q[1]]), sb, sz, curveLinear, { stroke: colour, 'stroke-width': 1.3, 'data-curve': `section x = ${s.x}` }));
      for (const q of s.offsets) marks.push(q.knuckle ? knuckleMark(sb(sign * q.y), sz(q.z)) : dot(sb(sign * q.y), sz(q.z)));
    }
    // Offsets on the drawn waterlines show in the plan too.
    for (const q of s.offsets) if (wlHeights.has(q.z)) marks.push(q.knuckle ? knuckleMark(sx(s.x), sy(q.y)) : dot(sx(s.x), sy(q.y)));
  }

  // Offsets reported unfair: ringed in each view that shows them, and numbered.
  for (const w of d.warnings) {
    const spots: [number, number][] = [[sx(w.x), sz(w.z)], ...side(w.x).map((sign): [number, number] => [sb(sign * w.y), sz(w.z)])];
    if (wlHeights.has(w.z)) spots.push([sx(w.x), sy(w.y)]);
    for (const [cx, cy] of spots) {
      marks.push(ring(cx, cy));
      marks.push(text(cx + 8, cy - 8, String(w.label), { 'font-size': 11, 'font-weight': 700, fill: INK.warn }));
    }
  }

  const axes = [
    bottomAxis(sx, planBottom + 8, { title: 'x, m (positive forward)', ticks: Math.max(4, Math.round((k * length) / 70)) }),
    leftAxis(sz, left - 8, { title: 'z, m', ticks: Math.max(2, Math.round((k * depth) / 40)) }),
    leftAxis(sy, left - 8, { title: 'y, m', ticks: Math.max(2, Math.round((k * bmax) / 40)) }),
    bottomAxis(sb, profileBottom + 8, { title: 'half-breadth y, m', ticks: Math.max(3, Math.round((2 * k * bmax) / 50)), format: (v) => String(Math.abs(v)) }),
  ];
  const views = [
    text(left, top - 26, 'Profile', { 'font-size': 12, 'font-weight': 600, fill: INK.text }),
    text(bodyLeft, top - 26, 'Body plan', { 'font-size': 12, 'font-weight': 600, fill: INK.text }),
    text(left + 6, planTop - 4, 'Half-breadth plan', { 'font-size': 12, 'font-weight': 600, fill: INK.text }),
  ];

  const legendTop = Math.max(planBottom + 62, profileBottom + 60);
  const legend = legendRows(
    [
      { label: 'section aft of amidships', line: { stroke: AFT } },
      { label: 'section forward', line: { stroke: FWD } },
      { label: 'waterline', line: { stroke: AFT, 'stroke-width': 1.1 } },
      { label: 'keel and deck edge', line: { stroke: INK.text } },
      ...(d.knuckleLines.length > 0 ? [{ label: 'knuckle line', line: { stroke: KNUCKLE, 'stroke-dasharray': '6 3' } }] : []),
      { label: 'offset', mark: dot },
      { label: 'knuckle', mark: knuckleMark },
      { label: 'offset reported unfair', mark: (cx: number, cy: number) => ring(cx, cy) },
    ],
    left,
    legendTop,
    W - right,
  );
  const notes: string[] = [];
  let y = legendTop + legend.height + 6;
  const head = d.warnings.length === 0 ? 'The fairness check reports no offset.' : `The fairness check reports ${d.warnings.length} offset${d.warnings.length === 1 ? '' : 's'} (ringed):`;
  notes.push(text(left, y, head, { 'font-size': 12, fill: d.warnings.length === 0 ? INK.text : INK.warn, 'data-role': 'fairness' }));
  for (const w of d.warnings) {
    for (const [n, part] of wrapWords(`${w.label}. ${w.message}`, Math.floor((W - left - right) / 6.3)).entries()) {
      y += 15;
      notes.push(text(left + (n === 0 ? 0 : 16), y, part, { 'font-size': 11.5, fill: INK.text, 'data-role': 'warning' }));
    }
  }
  const height = y + 16;

  const desc =
    `The lines of ${d.name}: the profile with the keel, the deck edge and ${d.stations.length} stations; ` +
    `the half-breadth plan with ${d.waterlines.length} waterlines; the body plan with the sections aft of amidships left of the centreline ` +
    `and those forward of it right. Offsets are dots, knuckles squares${d.knuckleLines.length > 0 ? `, ${d.knuckleLines.length} knuckle line${d.knuckleLines.length === 1 ? '' : 's'} dashed` : ''}. ` +
    (d.warnings.length === 0 ? 'The fairness check reports no offset.' : `${d.warnings.length} offsets reported unfair are ringed and listed: ${d.warnings.map((w) => `${w.label}. ${w.message}`).join(' ')}`);
  return plotDocument({
    id: 'hb-lines',
    width: W,
    height,
    title: `Lines: ${d.name}`,
    desc,
    body: [el('g', { 'data-role': 'grid' }, grid), ...axes, el('g', { 'data-role': 'curves' }, curves), el('g', { 'data-role': 'marks' }, marks), ...labels, ...views, legend.svg, ...notes].join(''),
  });
}

