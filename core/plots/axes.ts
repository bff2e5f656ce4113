/**
 * Axes drawn from d3-scale linear scales: the scale chooses the ticks (1, 2, 5 steps)
 * and their number format (d3-format through scale.tickFormat); this file only writes
 * them as SVG lines and text. Each axis has a title that names the quantity and its unit.
 */
import { scaleLinear, type ScaleLinear } from 'd3-scale';
import { el, INK, text } from './svg.js';

export type Linear = ScaleLinear<number, number>;

export interface AxisOptions {
  /** Quantity and unit, e.g. "Draft, m". */
  readonly title: string;
  /** About how many ticks. */
  readonly ticks?: number;
  /** Grid lines across the plot from the axis to this coordinate (the other axis's far end). */
  readonly gridTo?: number;
  /** Tick label; the scale's own tick format by default. */
  readonly format?: (v: number) => string;
}

function tickLabels(scale: Linear, o: AxisOptions): { values: number[]; label: (v: number) => string } {
  const count = o.ticks ?? 8;
  const f = o.format ?? scale.tickFormat(count);
  return { values: scale.ticks(count), label: (v) => f(v).replace('−', '-') };
}

/** An axis along the foot of a plot at height `y`, ticks down, title below. */
export function bottomAxis(scale: Linear, y: number, o: AxisOptions): string {
  const [r0, r1] = scale.range() as [number, number];
  const { values, label } = tickLabels(scale, o);
  const parts = [el('line', { x1: r0, x2: r1, y1: y, y2: y, stroke: INK.axis })];
  for (const v of values) {
    const x = scale(v);
    if (o.gridTo !== undefined) parts.push(el('line', { x1: x, x2: x, y1: y, y2: o.gridTo, stroke: INK.grid, 'stroke-width': 0.7 }));
    parts.push(el('line', { x1: x, x2: x, y1: y, y2: y + 5, stroke: INK.axis }));
    parts.push(text(x, y + 17, label(v), { 'text-anchor': 'middle', 'font-size': 11, fill: INK.text }));
  }
  parts.push(text((r0 + r1) / 2, y + 34, o.title, { 'text-anchor': 'middle', 'font-size': 12, fill: INK.text, 'data-role': 'axis-title' }));
  return el('g', { 'data-axis': 'x' }, parts);
}

/** An axis up the left of a plot at `x`, ticks out to the left, title turned up the side. */
export function leftAxis(scale: Linear, x: number, o: AxisOptions): string {
  const [r0, r1] = scale.range() as [number, number];
  const { values, label } = tickLabels(scale, o);
  const parts = [el('line', { x1: x, x2: x, y1: r0, y2: r1, stroke: INK.axis })];
  for (const v of values) {
    const y = scale(v);
    if (o.gridTo !== undefined) parts.push(el('line', { x1: x, x2: o.gridTo, y1: y, y2: y, stroke: INK.grid, 'stroke-width': 0.7 }));
    parts.push(el('line', { x1: x - 5, x2: x, y1: y, y2: y, stroke: INK.axis }));
    parts.push(text(x - 8, y + 4, label(v), { 'text-anchor': 'end', 'font-size': 11, fill: INK.text }));
  }
  const mid = (r0 + r1) / 2;
  parts.push(text(x - 46, mid, o.title, { 'text-anchor': 'middle', 'font-size': 12, fill: INK.text, transform: `rotate(-90 ${x - 46} ${mid})`, 'data-role': 'axis-title' }));
  return el('g', { 'data-axis': 'y' }, parts);
}

export interface XYFrame {
  readonly sx: Linear;
  readonly sy: Linear;
  /** Axes and grid, SVG text. */
  readonly axes: string;
  readonly left: number;
  readonly right: number;
  readonly top: number;
  readonly bottom: number;
}

export interface XYFrameOptions {
  readonly width: number;
  readonly top?: number;
  readonly plotHeight: number;
  readonly x: readonly [number, number];
  readonly y: readonly [number, number];
  readonly xAxis: AxisOptions;
  readonly yAxis: AxisOptions;
  /** Round the domains outward to tick values (d3's scale.nice). */
  readonly nice?: boolean;
}

/** A plot area with a grid, an x axis below and a y axis to the left. */
export function xyFrame(o: XYFrameOptions): XYFrame {
  const left = 78;
  const right = o.width - 28;
  const top = o.top ?? 48;
  const bottom = top + o.plotHeight;
  const sx = scaleLinear().domain(o.x).range([left, right]);
  const sy = scaleLinear().domain(o.y).range([bottom, top]);
  if (o.nice !== false) {
    sx.nice(o.xAxis.ticks ?? 8);
    sy.nice(o.yAxis.ticks ?? 8);
  }
  const axes = bottomAxis(sx, bottom, { ...o.xAxis, gridTo: top }) + leftAxis(sy, left, { ...o.yAxis, gridTo: right });
  return { sx, sy, axes, left, right, top, bottom };
}
