/**
 * The curve of sectional areas as SVG: each station's immersed area against x at one
 * draft, with the LCB (the centroid of the area under the curve) and amidships marked,
 * and the volume (the area under the curve) and prismatic coefficient written beside.
 */
import { area, curveMonotoneX, line } from 'd3-shape';
import { xyFrame } from './axes.js';
import { short } from './scaleText.js';
import { el, INK, plotDocument, text } from './svg.js';
import type { SectionalAreaCurve } from '../upright/sectionalAreaCurve.js';

export interface SectionalAreaPlotData {
  readonly name: string;
  /** core/upright/sectionalAreaCurve.ts sectionalAreaCurve(). */
  readonly curve: SectionalAreaCurve;
}

export function sectionalAreaPlot(d: SectionalAreaPlotData): string {
  const c = d.curve;
  const W = 980;
  const xs = c.stations.map((s) => s.x);
  const amax = Math.max(0, ...c.stations.map((s) => s.area));
  const f = xyFrame({
    width: W,
    plotHeight: 340,
    x: [Math.min(...xs), Math.max(...xs)],
    y: [0, amax > 0 ? amax * 1.08 : 1],
    xAxis: { title: 'x, m (positive forward)', ticks: 12 },
    yAxis: { title: 'immersed sectional area, m²', ticks: 8 },
  });
  const pts = c.stations.map((s): [number, number] => [s.x, s.area]);
  const under = area<[number, number]>().x((q) => f.sx(q[0])).y0(f.sy(0)).y1((q) => f.sy(q[1])).curve(curveMonotoneX).digits(2)(pts) ?? '';
  const over = line<[number, number]>().x((q) => f.sx(q[0])).y((q) => f.sy(q[1])).curve(curveMonotoneX).digits(2)(pts) ?? '';
  const marks: string[] = [];
  const vline = (x: number, label: string, colour: string, dash: string, role: string, dy: number): void => {
    if (!Number.isFinite(x)) return;
    marks.push(el('line', { x1: f.sx(x), x2: f.sx(x), y1: f.bottom, y2: f.top, stroke: colour, 'stroke-width': 1.6, 'stroke-dasharray': dash, 'data-role': role }));
    marks.push(text(f.sx(x) + 5, f.top + dy, label, { 'font-size': 11.5, fill: colour, 'font-weight': 600 }));
  };
  vline(c.lcb, `LCB x = ${short(c.lcb)} m`, '#D55E00', '6 3', 'lcb', 14);
  vline(c.amidships, `amidships x = ${short(c.amidships)} m`, INK.axis, '2 3', 'amidships', 30);
  const summary = `draft ${short(c.draft)} m: volume (area under the curve) ${short(c.volume)} m³; Am ${short(c.am)} m²; LWL ${short(c.lwl)} m; Cp ${short(c.cp, 3)}`;
  const height = f.bottom + 70;
  return plotDocument({
    id: 'hb-sectional-areas',
    width: W,
    height,
    title: `Sectional-area curve at draft ${short(c.draft)} m: ${d.name}`,
    desc:
      `Immersed area of each of ${c.stations.length} stations of ${d.name} against x at draft ${short(c.draft)} m; the largest is ${short(amax)} m². ` +
      `The LCB, at x = ${short(c.lcb)} m, is the centroid of the area under the curve; amidships is at x = ${short(c.amidships)} m. ${summary}.`,
    body: [
      f.axes,
      el('path', { d: under, fill: '#56B4E9', 'fill-opacity': 0.22, stroke: 'none' }),
      el('path', { d: over, fill: 'none', stroke: '#0072B2', 'stroke-width': 2, 'data-curve': 'sectional area' }),
      ...pts.map(([x, a]) => el('circle', { cx: f.sx(x), cy: f.sy(a), r: 2.6, fill: '#0072B2' })),
      ...marks,
      text(f.left, f.bottom + 56, summary, { 'font-size': 12, fill: INK.text, 'data-role': 'summary' }),
    ].join(''),
  });
}
