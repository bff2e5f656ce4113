/**
 * Reading a plot back as a person reads it: the SVG parsed by a general XML parser
 * (@xmldom/xmldom, a W3C DOM), each axis's scale taken from its own tick labels and tick
 * positions, and the vertices of a path from its `d` text (SVG 1.1, "Path data"). The
 * plots' own scales are never used, so a check through these is a check of the drawing.
 */
import { DOMParser, type Document, type Element } from '@xmldom/xmldom';

/** Parse an SVG document; any XML error fails. */
export function parseSvg(text: string): Document {
  const errors: string[] = [];
  const doc = new DOMParser({ onError: (level, msg) => { if (level !== 'warning') errors.push(msg); } }).parseFromString(text, 'image/svg+xml');
  if (errors.length > 0) throw new Error(`the SVG does not parse: ${errors.join('; ')}`);
  return doc;
}

/** Every element of a tag, in document order. */
export function all(doc: Document | Element, tag: string): Element[] {
  return Array.from(doc.getElementsByTagName(tag) as unknown as ArrayLike<Element>);
}

export const attr = (e: Element, name: string): string => e.getAttribute(name) ?? '';
export const num = (e: Element, name: string): number => Number(e.getAttribute(name));
export const textOf = (e: Element): string => e.textContent ?? '';

export interface ReadScale {
  /** Pixel position of a value. */
  (v: number): number;
  readonly ticks: readonly { value: number; px: number }[];
}

/**
 * The scale of the k-th axis of a kind ('x' runs along the foot, 'y' up the side): its
 * tick labels (numbers) paired with their positions, and the straight line through them.
 * Fails unless every tick lies on that line.
 */
export function axisScale(doc: Document, kind: 'x' | 'y', k = 0, half?: 'from-zero'): ReadScale {
  const axes = all(doc, 'g').filter((g) => attr(g, 'data-axis') === kind);
  const axis = axes[k];
  if (axis === undefined) throw new Error(`no ${kind} axis number ${k}`);
  const ticks = all(axis, 'text')
    .filter((t) => attr(t, 'data-role') !== 'axis-title')
    .map((t) => ({ value: Number(textOf(t).replace('\u2212', '-')), px: kind === 'x' ? num(t, 'x') : num(t, 'y') - 4 }))
    .filter((t) => Number.isFinite(t.value))
    // An axis labelled with magnitudes both sides of zero (a body plan's half-breadths): read from zero on.
    .filter((t, _i, list) => half === undefined || t.px >= list.find((u) => u.value === 0)!.px);
  if (ticks.length < 2) throw new Error(`the ${kind} axis has fewer than two numbered ticks`);
  const a = ticks[0]!;
  const b = ticks[ticks.length - 1]!;
  const slope = (b.px - a.px) / (b.value - a.value);
  const f = ((v: number) => a.px + (v - a.value) * slope) as ReadScale;
  for (const t of ticks) if (Math.abs(f(t.value) - t.px) > 0.02) throw new Error(`tick ${t.value} of the ${kind} axis is off its line`);
  return Object.assign(f, { ticks });
}

/** The end point of every command of a path's data (M, L, C, H, V, Z), absolute coordinates as d3-path writes them. */
export function pathVertices(d: string): [number, number][] {
  const out: [number, number][] = [];
  let x = 0;
  let y = 0;
  for (const m of d.matchAll(/([MLCHVZmlchvz])([^MLCHVZmlchvz]*)/g)) {
    const n = (m[2] ?? '').trim() === '' ? [] : m[2]!.trim().split(/[\s,]+/).map(Number);
    switch (m[1]) {
      case 'M': case 'L': x = n[n.length - 2]!; y = n[n.length - 1]!; break;
      case 'C': x = n[4]!; y = n[5]!; break;
      case 'H': x = n[0]!; break;
      case 'V': y = n[0]!; break;
      case 'Z': case 'z': continue;
      default: throw new Error(`path command ${m[1]} is not read here`);
    }
    out.push([x, y]);
  }
  return out;
}

/** Whether some vertex lies within `tol` px of (x, y). */
export function hasVertex(vertices: readonly [number, number][], x: number, y: number, tol = 0.05): boolean {
  return vertices.some(([vx, vy]) => Math.abs(vx - x) <= tol && Math.abs(vy - y) <= tol);
}
