/**
 * The cross curves of stability as SVG: KN against displacement, one curve per heel,
 * each labelled with its heel at its right-hand end.
 */
import { group } from 'd3-array';
import { curveMonotoneX, line } from 'd3-shape';
import { xyFrame } from './axes.js';
import { legendRows } from './legend.js';
import { short } from './scaleText.js';
import { curveStroke, el, INK, plotDocument, text } from './svg.js';
import type { CrossCurvePoint as CrossCurveRow } from './stabilityShapes.js';

export interface CrossCurvesPlotData {
  readonly name: string;
  readonly rows: readonly CrossCurveRow[];
  /** What the trim was held at, said in the title: 'level' or 'free'. */
  readonly trim?: 'level' | 'free';
}

export function crossCurvesPlot(d: CrossCurvesPlotData): string {
  const W = 980;
  const byHeel = [...group(d.rows, (r) => r.heel)].sort((a, b) => a[0] - b[0]);
  const disp = d.rows.map((r) => r.displacement);
  const kn = d.rows.map((r) => r.kn);
  const f = xyFrame({
    width: W - 40,
    plotHeight: 380,
    x: [Math.min(...disp), Math.max(...disp)],
    y: [Math.min(0, ...kn), Math.max(0, ...kn)],
    xAxis: { title: 'displacement, t', ticks: 10 },
    yAxis: { title: 'KN, m', ticks: 8 },
  });
  const curves: string[] = [];
  const ends: { x: number; y: number; text: string; colour: string }[] = [];
  byHeel.forEach(([heel, rows], i) => {
    const pts = [...rows].sort((a, b) => a.displacement - b.displacement).map((r): [number, number] => [r.displacement, r.kn]);
    const dpath = line<[number, number]>().x((q) => f.sx(q[0])).y((q) => f.sy(q[1])).curve(curveMonotoneX).digits(2)(pts) ?? '';
    curves.push(el('path', { d: dpath, fill: 'none', 'stroke-width': 1.8, ...curveStroke(i), 'data-curve': `heel ${heel}` }));
    for (const [x, y] of pts) curves.push(el('circle', { cx: f.sx(x), cy: f.sy(y), r: 2, fill: curveStroke(i).stroke }));
    const last = pts[pts.length - 1];
    if (last !== undefined) ends.push({ x: f.sx(last[0]) + 6, y: f.sy(last[1]) + 4, text: `${short(heel)}°`, colour: curveStroke(i).stroke });
  });
  // Heel labels at the right-hand ends, pushed apart where curves end close together.
  ends.sort((a, b) => b.y - a.y);
  for (let k = 1; k < ends.length; k++) ends[k]!.y = Math.min(ends[k]!.y, ends[k - 1]!.y - 12);
  const labels = ends.map((e) => text(e.x, e.y, e.text, { 'font-size': 11, 'font-weight': 600, fill: e.colour }));
  const legend = legendRows(
    byHeel.map(([heel], i) => ({ label: `heel ${short(heel)}°`, line: curveStroke(i) })),
    f.left,
    f.bottom + 60,
    W - 20,
  );
  const trim = d.trim === 'free' ? 'free trim' : 'level trim';
  return plotDocument({
    id: 'hb-cross-curves',
    width: W,
    height: f.bottom + 60 + legend.height,
    title: `Cross curves of stability (KN), ${trim}: ${d.name}`,
    desc:
      `KN of ${d.name} against displacement from ${short(Math.min(...disp))} to ${short(Math.max(...disp))} t, ${trim}, one curve for each heel: ` +
      byHeel.map(([heel, rows]) => `${short(heel)}° (KN ${short(Math.min(...rows.map((r) => r.kn)))} to ${short(Math.max(...rows.map((r) => r.kn)))} m)`).join(', ') +
      '.',
    body: [f.axes, el('g', { 'data-role': 'curves' }, curves), ...labels, legend.svg, text(f.right - 4, f.top + 14, trim, { 'text-anchor': 'end', 'font-size': 11, fill: INK.axis })].join(''),
  });
}
