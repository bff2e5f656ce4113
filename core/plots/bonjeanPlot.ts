/**
 * The Bonjean curves as SVG, drawn on the profile as the trade draws them: at each
 * station, its immersed area (both sides) against the height of the waterline, set off
 * forward from the station line at one area scale for all stations. A waterline drawn
 * across them reads each station's area where it cuts its curve.
 */
import { curveLinear, curveMonotoneY, line } from 'd3-shape';
import { xyFrame } from './axes.js';
import { roundStep, short } from './scaleText.js';
import { el, INK, plotDocument, text } from './svg.js';
import type { BonjeanStation } from '../upright/bonjean.js';

export interface BonjeanPlotData {
  readonly name: string;
  /** core/upright/bonjean.ts bonjean(): each station's areas from its keel to its deck edge. */
  readonly stations: readonly BonjeanStation[];
}

/** The area scale: m² of area per metre along x, a round number that keeps the largest curve within 0.9 of the typical station spacing. */
export function bonjeanAreaScale(stations: readonly BonjeanStation[]): number {
  const xs = stations.map((s) => s.x);
  const gaps = xs.slice(1).map((x, i) => x - xs[i]!).sort((a, b) => a - b);
  const spacing = gaps.length > 0 ? gaps[Math.floor(gaps.length / 2)]! : 1;
  const maxArea = Math.max(0, ...stations.flatMap((s) => s.points.map((q) => q.area)));
  return roundStep(maxArea / (0.9 * spacing));
}

export function bonjeanPlot(d: BonjeanPlotData): string {
  const W = 980;
  const perMetre = bonjeanAreaScale(d.stations);
  const xs = d.stations.map((s) => s.x);
  const reach = Math.max(...d.stations.map((s) => s.x + Math.max(0, ...s.points.map((q) => q.area)) / perMetre));
  const zlo = Math.min(0, ...d.stations.map((s) => s.keel));
  const zhi = Math.max(...d.stations.map((s) => s.deck));
  const f = xyFrame({
    width: W,
    plotHeight: 360,
    x: [Math.min(...xs), Math.max(reach, ...xs)],
    y: [zlo, zhi],
    xAxis: { title: `x, m (station positions; each curve set off forward at ${short(perMetre)} m² of area per metre)`, ticks: 12 },
    yAxis: { title: 'height of waterline z, m', ticks: 8 },
  });
  const lines: string[] = [];
  const curves: string[] = [];
  for (const s of d.stations) {
    lines.push(el('line', { x1: f.sx(s.x), x2: f.sx(s.x), y1: f.sy(s.keel), y2: f.sy(s.deck), stroke: INK.faint }));
    const pts = s.points.map((q): [number, number] => [s.x + q.area / perMetre, q.z]);
    const dpath = line<[number, number]>().x((q) => f.sx(q[0])).y((q) => f.sy(q[1])).curve(curveMonotoneY).digits(2)(pts) ?? '';
    curves.push(el('path', { d: dpath, fill: 'none', stroke: '#0072B2', 'stroke-width': 1.6, 'data-curve': `station x = ${s.x}` }));
    for (const [x, z] of pts) curves.push(el('circle', { cx: f.sx(x), cy: f.sy(z), r: 1.8, fill: '#0072B2' }));
  }
  const profile = (pick: (s: BonjeanStation) => number, name: string): string =>
    el('path', {
      d: line<BonjeanStation>().x((s) => f.sx(s.x)).y((s) => f.sy(pick(s))).curve(curveLinear).digits(2)([...d.stations]) ?? '',
      fill: 'none',
      stroke: INK.text,
      'stroke-width': 1.4,
      'data-curve': name,
    });
  // A scale bar: one metre along x is `perMetre` m² of area.
  const barY = f.top + 14;
  const bar =
    el('line', { x1: f.left + 12, x2: f.left + 12 + (f.sx(f.sx.domain()[0]! + 1) - f.sx(f.sx.domain()[0]!)), y1: barY, y2: barY, stroke: '#0072B2', 'stroke-width': 3 }) +
    text(f.left + 12, barY - 6, `area scale: this bar is ${short(perMetre)} m²`, { 'font-size': 11, fill: INK.text });
  const height = f.bottom + 52;
  const desc =
    `Bonjean curves of ${d.name}: for each of ${d.stations.length} stations, the immersed area of the section (both sides) against the height ` +
    `of the waterline, drawn forward from the station line at ${short(perMetre)} m² per metre along x, on the profile of keel and deck edge. ` +
    `The largest area is ${short(Math.max(0, ...d.stations.flatMap((s) => s.points.map((q) => q.area))))} m².`;
  return plotDocument({
    id: 'hb-bonjean',
    width: W,
    height,
    title: `Bonjean curves: ${d.name}`,
    desc,
    body: [f.axes, el('g', { 'data-role': 'stations' }, lines), profile((s) => s.keel, 'keel'), profile((s) => s.deck, 'deck edge'), el('g', { 'data-role': 'curves' }, curves), bar].join(''),
  });
}
