/** A row of legend entries: a short sample of each line or mark, then its words. */
import { el, text, INK, type Attrs } from './svg.js';

export interface LegendEntry {
  readonly label: string;
  /** Attributes of the sample line (stroke, dash); or a mark drawn instead. */
  readonly line?: Attrs;
  readonly mark?: (cx: number, cy: number) => string;
}

/** Entries laid out left to right from (x, y), wrapping at `maxX`; returns the SVG and the height used. */
export function legendRows(entries: readonly LegendEntry[], x: number, y: number, maxX: number): { svg: string; height: number } {
  const parts: string[] = [];
  let cx = x;
  let cy = y;
  for (const e of entries) {
    const w = 34 + e.label.length * 6.2 + 18;
    if (cx + w > maxX && cx > x) {
      cx = x;
      cy += 18;
    }
    if (e.mark !== undefined) parts.push(e.mark(cx + 12, cy - 4));
    else parts.push(el('line', { x1: cx, x2: cx + 26, y1: cy - 4, y2: cy - 4, 'stroke-width': 2, ...e.line }));
    parts.push(text(cx + 32, cy, e.label, { 'font-size': 11, fill: INK.text }));
    cx += w;
  }
  return { svg: el('g', { 'data-role': 'legend' }, parts), height: cy - y + 18 };
}
