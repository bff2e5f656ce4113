/**
 * SVG text from plain values: escaping, elements, the plots' shared frame (title and
 * description for screen readers, a white sheet, the caution in small print) and the
 * palette. Every plot is built from these, so each one is a standalone document that
 * can also be set inline in a page: styling is by presentation attributes, never a
 * <style> element, whose rules would leak into the page around it.
 */
import { CAUTION } from '../common/caution.js';

/** Text for an XML text node or attribute value. */
export function esc(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/** A coordinate as written: two decimals are a hundredth of a pixel, plenty for print. */
export function px(v: number): string {
  return String(Math.round(v * 100) / 100);
}

export type Attrs = Readonly<Record<string, string | number | undefined>>;

/** One element; attribute values are escaped, numbers written with `px`, undefined left out; children are SVG text already. */
export function el(tag: string, attrs: Attrs, children?: string | readonly string[]): string {
  const a = Object.entries(attrs)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => ` ${k}="${typeof v === 'number' ? px(v) : esc(v!)}"`)
    .join('');
  const inner = children === undefined ? '' : typeof children === 'string' ? children : children.join('');
  return inner === '' && children === undefined ? `<${tag}${a}/>` : `<${tag}${a}>${inner}</${tag}>`;
}

/** A text element; `content` is plain text and is escaped here. */
export function text(x: number, y: number, content: string, attrs: Attrs = {}): string {
  return el('text', { x, y, ...attrs }, esc(content));
}

/**
 * Colours that stay apart for the common forms of colour blindness: the palette of
 * M. Okabe and K. Ito, "Color Universal Design" (2008), less its yellow, which is too
 * pale on white. Each curve also gets a dash pattern (DASHES), so curves stay apart in
 * grey print, where two of these colours can come out the same grey.
 */
export const COLOURS = ['#0072B2', '#D55E00', '#009E73', '#CC79A7', '#E69F00', '#56B4E9', '#000000'] as const;
export const DASHES = [undefined, '7 3', '2 2', '9 3 2 3'] as const;

/** Stroke of the i-th curve of a plot: colour and dash vary together, so 28 curves differ in one or the other. */
export function curveStroke(i: number): { stroke: string; 'stroke-dasharray': string | undefined } {
  return { stroke: COLOURS[i % COLOURS.length]!, 'stroke-dasharray': DASHES[i % DASHES.length] };
}

/** Ink of the frame: axes, labels, grid. */
export const INK = { text: '#1b1f24', axis: '#3a4048', grid: '#d9dde3', faint: '#8a929c', warn: '#D55E00', pass: '#006B4F', fail: '#B3261E' } as const;

export const FONT = 'system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif';

/** Words of `content` in lines of at most `width` characters. */
export function wrapWords(content: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of content.split(/\s+/).filter((w) => w !== '')) {
    if (line !== '' && line.length + 1 + word.length > width) {
      lines.push(line);
      line = word;
    } else line = line === '' ? word : `${line} ${word}`;
  }
  if (line !== '') lines.push(line);
  return lines;
}

/** Height the caution takes at the foot of a plot `width` wide, px. */
export function cautionHeight(width: number): number {
  return 12 + 11 * wrapWords(CAUTION, cautionChars(width)).length;
}

const cautionChars = (width: number): number => Math.max(40, Math.floor((width - 24) / 5.2));

export interface PlotDocument {
  /** Id of the plot, used to make the ids of its title, description and clip paths unique in a page. */
  readonly id: string;
  readonly width: number;
  /** Height of the drawing; the caution is added below it. */
  readonly height: number;
  /** Short title, read first by a screen reader and shown at the top. */
  readonly title: string;
  /** What the plot shows, in words, for a screen reader. */
  readonly desc: string;
  /** The drawing, SVG text. */
  readonly body: string;
}

/** The whole SVG document of a plot: title, description, the drawing, the caution in small print. */
export function plotDocument(d: PlotDocument): string {
  const lines = wrapWords(CAUTION, cautionChars(d.width));
  const total = d.height + cautionHeight(d.width);
  const caution = el(
    'text',
    { x: 12, y: d.height + 12, 'font-size': 9.5, fill: INK.axis, 'data-role': 'caution' },
    lines.map((l, k) => el('tspan', { x: 12, dy: k === 0 ? 0 : 11 }, esc(l))),
  );
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" viewBox="0 0 ${px(d.width)} ${px(total)}" width="${px(d.width)}" height="${px(total)}"` +
    ` role="img" aria-labelledby="${esc(d.id)}-title ${esc(d.id)}-desc" font-family="${esc(FONT)}" data-plot="${esc(d.id)}">` +
    el('title', { id: `${d.id}-title` }, esc(d.title)) +
    el('desc', { id: `${d.id}-desc` }, esc(d.desc)) +
    el('rect', { x: 0, y: 0, width: d.width, height: total, fill: '#ffffff' }) +
    text(12, 22, d.title, { 'font-size': 15, 'font-weight': 600, fill: INK.text }) +
    d.body +
    caution +
    '</svg>\n'
  );
}
