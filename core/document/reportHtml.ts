/**
 * The printable report of a hull: one self-contained HTML document (no script, no
 * file or network fetched: styles and plots are inline) with the hull's particulars,
 * its offsets, the lines, the hydrostatic table and the curves of form, the Bonjean and
 * sectional-area curves, and, when stability results are supplied, the cross curves,
 * the GZ curve and the criteria. The caution is printed in the foot margin of every
 * page (a CSS page-margin box, which the browser repeats on each printed page) and at
 * the head of the first; the input's sha256 and the date of the report are given.
 *
 * Pure: the caller computes the hash and gives the date, so the same input and date
 * give the same document.
 */
import { CAUTION } from '../common/caution.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { fairnessWarnings } from '../fairness/fairness.js';
import { HYDROSTATIC_FIELDS, type HydrostaticRow } from '../upright/hydrostaticFields.js';
import { bonjean } from '../upright/bonjean.js';
import { hydrostaticTable } from '../upright/hydrostatics.js';
import { sectionalAreaCurve } from '../upright/sectionalAreaCurve.js';
import { hullSummary } from '../report/formatHydrostatics.js';
import { textCell } from '../report/textTable.js';
import { bonjeanPlot } from '../plots/bonjeanPlot.js';
import { crossCurvesPlot } from '../plots/crossCurvesPlot.js';
import { curvesOfFormPlot } from '../plots/curvesOfFormPlot.js';
import { criterionWords, gzPlot } from '../plots/gzPlot.js';
import { linesData } from '../plots/linesData.js';
import { linesPlot } from '../plots/linesPlot.js';
import { defaultDrafts } from '../plots/plotCatalogue.js';
import { short, unitText } from '../plots/scaleText.js';
import { sectionalAreaPlot } from '../plots/sectionalAreaPlot.js';
import type { CrossCurvePoint as CrossCurveRow } from '../plots/stabilityShapes.js';
import { CRITERIA_NOTES } from '../stability/criteria.js';
import type { GzResult } from '../stability/rightingLevers.js';
import { esc } from '../plots/svg.js';

export const PAPER_SIZES = ['a4', 'letter'] as const;
export type PaperSize = (typeof PAPER_SIZES)[number];

/** Stability results to print, when they have been computed (each part optional). */
export interface ReportStability {
  readonly crossCurves?: { readonly rows: readonly CrossCurveRow[]; readonly trim?: 'level' | 'free' };
  readonly gz?: { readonly result: GzResult };
}

export interface ReportInput {
  readonly prepared: PreparedHull;
  /** How the offsets were given: grid, points or model, and their length unit. */
  readonly form: string;
  readonly units: string;
  /** sha256 of the input as read, hex. */
  readonly sha256: string;
  /** The date (and time) of the report, as it is to be printed, e.g. 2026-12-02T19:10Z. */
  readonly date: string;
  readonly paper: PaperSize;
  /** t/m³ */
  readonly density: number;
  /** Drafts of the hydrostatic table; defaultDrafts when left out. */
  readonly drafts?: readonly number[];
  /** Draft of the sectional-area curve; the middle draft of the table when left out. */
  readonly areasDraft?: number;
  readonly stability?: ReportStability;
}

/** The date of a report as printed: UTC, to the minute. */
export function reportDate(now: Date): string {
  return `${now.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}

/** Text for a CSS string literal. */
function cssString(text: string): string {
  return `"${text.replace(/\\/g, '\\\\').replace(/"/g, '\\"').replace(/\n/g, ' ')}"`;
}

const PAGE: Record<PaperSize, string> = { a4: 'A4', letter: 'letter' };

function style(paper: PaperSize): string {
  return `
@page { size: ${PAGE[paper]} portrait; margin: 14mm 13mm 24mm 13mm;
  @bottom-left { content: ${cssString(CAUTION)}; font: 6.8pt/1.3 system-ui, sans-serif; color: #333; vertical-align: top; padding-top: 3mm; width: 82%; }
  @bottom-right { content: "page " counter(page) " of " counter(pages); font: 7pt system-ui, sans-serif; color: #333; vertical-align: top; padding-top: 3mm; }
}
:root { color: #1b1f24; font: 10pt/1.4 system-ui, -apple-system, "Segoe UI", Roboto, Arial, sans-serif; }
body { margin: 0 auto; max-width: 190mm; }
h1 { font-size: 17pt; margin: 0 0 2mm; }
h2 { font-size: 12.5pt; margin: 6mm 0 2mm; border-bottom: 0.4mm solid #0072B2; padding-bottom: 1mm; break-after: avoid; }
.caution { border: 0.4mm solid #B35900; background: #FFF4E5; padding: 2mm 3mm; margin: 3mm 0; }
dl.facts { display: grid; grid-template-columns: max-content 1fr; gap: 0.5mm 5mm; margin: 2mm 0; }
dl.facts dt { font-weight: 600; }
dl.facts dd { margin: 0; overflow-wrap: anywhere; }
table { border-collapse: collapse; font-size: 7.6pt; margin: 2mm 0; font-variant-numeric: tabular-nums; }
th, td { border: 0.2mm solid #b8bec6; padding: 0.5mm 1.2mm; text-align: right; }
th { background: #EEF2F6; }
thead { display: table-header-group; }
tr { break-inside: avoid; }
figure { margin: 3mm 0; break-inside: avoid; }
figure svg { width: 100%; height: auto; display: block; }
.note { font-size: 8.5pt; color: #3a4048; }
.fail { color: #B3261E; font-weight: 700; } .pass { color: #006B4F; font-weight: 700; }
@media screen { body { padding: 8mm; } }
`;
}

function facts(pairs: readonly (readonly [string, string])[]): string {
  return `<dl class="facts">${pairs.map(([k, v]) => `<dt>${esc(k)}</dt><dd>${esc(v)}</dd>`).join('')}</dl>`;
}

function table(head: readonly string[], rows: readonly (readonly string[])[], caption?: string): string {
  const cap = caption === undefined ? '' : `<caption>${esc(caption)}</caption>`;
  return `<table>${cap}<thead><tr>${head.map((h) => `<th scope="col">${esc(h)}</th>`).join('')}</tr></thead><tbody>${rows
    .map((r) => `<tr>${r.map((c) => `<td>${esc(c)}</td>`).join('')}</tr>`)
    .join('')}</tbody></table>`;
}

function figure(svg: string): string {
  return `<figure>${svg}</figure>`;
}

/** The offsets as a table: stations down, waterlines across for a grid table; one row per point otherwise. */
function offsetsTable(p: PreparedHull): string {
  const wl = p.hull.waterlines;
  if (wl !== undefined) {
    const rows = p.hull.stations.map((st) => [short(st.x, 6), ...wl.map((z) => {
      const q = st.points.find((pt) => pt.z === z);
      return q === undefined ? '' : q.y.toFixed(3);
    })]);
    return table(['x, m', ...wl.map((z) => `z ${short(z, 6)}`)], rows, 'Half-breadths, m, at each station (rows) and waterline height (columns); blank where the station has no surface at that height.');
  }
  const rows = p.hull.stations.flatMap((st) => st.points.map((q, j) => [j === 0 ? short(st.x, 6) : '', q.y.toFixed(3), q.z.toFixed(3), q.knuckle ? 'knuckle' : '']));
  return table(['station x, m', 'y, m', 'z, m', ''], rows, 'Points of each half-section, keel to deck edge, m.');
}

/** The hydrostatic table in two halves, so that each fits the width of a page. */
function hydrostaticTables(rows: readonly HydrostaticRow[]): string {
  const fields = HYDROSTATIC_FIELDS.filter((f) => f.key !== 'draft');
  const half = Math.ceil(fields.length / 2);
  return [fields.slice(0, half), fields.slice(half)]
    .map((part) =>
      table(
        ['Draft, m', ...part.map((f) => `${f.label}${f.unit === '-' ? '' : `, ${unitText(f.unit)}`}`)],
        rows.map((r) => [textCell(r.draft, 'm'), ...part.map((f) => textCell(r[f.key], f.unit))]),
      ),
    )
    .join('');
}

function stabilitySections(name: string, s: ReportStability | undefined): string {
  const parts: string[] = [];
  if (s?.crossCurves !== undefined) {
    const cc = s.crossCurves;
    const heels = [...new Set(cc.rows.map((r) => r.heel))].sort((a, b) => a - b);
    const disps = [...new Set(cc.rows.map((r) => r.displacement))].sort((a, b) => a - b);
    const kn = new Map(cc.rows.map((r) => [`${r.displacement}|${r.heel}`, r.kn]));
    parts.push('<h2>Cross curves of stability</h2>', figure(crossCurvesPlot({ name, rows: cc.rows, trim: cc.trim ?? 'level' })));
    parts.push(table(['Displacement, t', ...heels.map((h) => `KN ${short(h)}°, m`)], disps.map((d) => [textCell(d, 't'), ...heels.map((h) => textCell(kn.get(`${d}|${h}`) ?? Number.NaN, 'm'))])));
  }
  if (s?.gz !== undefined) {
    const g = s.gz;
    const { displacement, kg, fsm } = g.result;
    const fs = fsm > 0 ? `, free-surface moment ${esc(short(fsm))} t·m` : '';
    parts.push(`<h2>Righting levers at ${esc(short(displacement))} t, KG ${esc(short(kg))} m${fs}</h2>`, figure(gzPlot({ name, result: g.result, displacement, kg })));
    // The figures read off the curve, and the curve itself as a table: what a checker
    // compares with a hand calculation or a stability book.
    const r = g.result;
    const angle = (a: number | null): string => (a === null ? 'none within the heels worked' : `${short(a)}°`);
    parts.push(
      `<p>KG + FSM / displacement ${esc(textCell(r.kgEffective, 'm'))} m; GM0 ${esc(textCell(r.gm0, 'm'))} m; largest GZ ${esc(textCell(r.maxGz, 'm'))} m at ${esc(short(r.angleOfMaxGz))}°; ` +
        `angle of vanishing stability ${esc(angle(r.vanishingAngle))}; ${r.lollAngle === null ? '' : `angle of loll ${esc(angle(r.lollAngle))} (GM0 below zero); `}downflooding angle ${esc(angle(r.downfloodingAngle))}; ${r.trim === 'free' ? 'free to trim' : 'at level trim'} as it heels.</p>`,
    );
    const area = new Map(r.areas.map((a) => [a.heel, a.area]));
    parts.push(table(['Heel, °', 'GZ, m', 'Area to heel, m·rad'], r.points.map((q) => [short(q.heel), textCell(q.gz, 'm'), textCell(area.get(q.heel) ?? Number.NaN, 'm.rad')])));
    parts.push(
      `<p>Criteria: ${esc(g.result.criteriaSet.name)} (${esc(g.result.criteriaSet.source)}).</p>`,
      table(['Criterion', 'Verdict'], g.result.criteria.map((c) => [criterionWords(c), c.pass ? 'pass' : 'FAIL'])),
      ...CRITERIA_NOTES.map((n) => `<p class="note">${esc(n)}</p>`),
    );
  }
  if (parts.length === 0) parts.push('<h2>Stability</h2><p>This report gives the upright hydrostatics only: it holds no cross curves, righting levers or stability criteria.</p>');
  return parts.join('');
}

export function reportHtml(r: ReportInput): string {
  const p = r.prepared;
  const s = hullSummary(p.hull);
  const drafts = r.drafts ?? defaultDrafts(p);
  const rows = hydrostaticTable(p, drafts, r.density);
  const areasDraft = r.areasDraft ?? drafts[Math.floor(drafts.length / 2)]!;
  const warnings = fairnessWarnings(p.hull);
  const name = p.hull.name;
  const body = [
    `<h1>Hydrostatics of ${esc(name)}</h1>`,
    `<p class="caution" role="note">${esc(CAUTION)}</p>`,
    facts([
      ['Hull', name],
      ['Report made', r.date],
      ['Input sha256', r.sha256],
      ['Offsets', `${r.form} form, lengths in ${r.units}; ${s.stations} stations${s.waterlines === null ? '' : `, ${s.waterlines} waterlines`}`],
      ['Perpendiculars', `AP x = ${short(s.ap)} m, FP x = ${short(s.fp)} m, LBP ${short(s.lbp)} m`],
      ['Draft range', `above the lowest keel (z = ${short(p.lowestKeel)} m) up to the lowest deck edge (z = ${short(p.lowestDeck)} m)`],
      ['Water density', `${r.density} t/m³`],
      ['Fairness check', warnings.length === 0 ? 'no offset reported' : `${warnings.length} offset${warnings.length === 1 ? '' : 's'} reported (ringed on the lines)`],
      ['Made by', 'Halfbreadth, from the offsets alone (Simpson\'s rules along the length, fitted sections up each station)'],
    ]),
    '<h2>Lines</h2>',
    figure(linesPlot(linesData(p, warnings))),
    '<h2>Table of offsets</h2>',
    offsetsTable(p),
    '<h2>Hydrostatic particulars</h2>',
    `<p class="note">Upright and level, density ${r.density} t/m³. Longitudinal positions are x in the offsets' frame (positive forward); heights are above the baseline.</p>`,
    hydrostaticTables(rows),
    '<h2>Curves of form</h2>',
    figure(curvesOfFormPlot({ name, density: r.density, rows })),
    '<h2>Bonjean curves</h2>',
    figure(bonjeanPlot({ name, stations: bonjean(p) })),
    '<h2>Sectional areas</h2>',
    figure(sectionalAreaPlot({ name, curve: sectionalAreaCurve(p, areasDraft) })),
    stabilitySections(name, r.stability),
  ].join('\n');
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Hydrostatics of ${esc(name)}</title>
<style>${style(r.paper)}</style></head>
<body>
${body}
</body></html>
`;
}
