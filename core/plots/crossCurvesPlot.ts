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
import type { CrossCurveRow } from './stabilityShapes.js';

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
  const labels: string[] = [];
  byHeel.forEach(([heel, rows], i) => {
    const pts = [...rows].sort((a, b) => a.displacement - b.displacement).map((r): [number, number] => [r.displacement, r.kn]);
    const dpath = line<[number, number]>().x((q) => f.sx(q[0])).y((q) => f.sy(q[1])).curve(curveMonotoneX).digits(2)(pts) ?? '';
    curves.push(el('path', { d: dpath, fill: 'none', 'stroke-width': 1.8, ...curveStroke(i), 'data-curve': `heel ${heel}` }));
    for (const [x, y] of pts) curves.push(el('circle', { cx: f.sx(x), cy: f.sy(y), r: 2, fill: curveStroke(i).stroke }));
    const last = pts[pts.length - 1];
    if (last !== undefined) labels.push(text(f.sx(last[0]) + 6, f.sy(last[1]) + 4, `${short(heel)}°`, { 'font-size': 11, 'font-weight': 600, fill: curveStroke(i).stroke }));
  });
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
