/**
 * The plot functions of core/plots, read back as a person reads a drawing: each SVG is
 * parsed by a general XML parser (@xmldom/xmldom), its axes read from their own tick
 * labels (test/helpers/svgRead.ts), and points checked where the data puts them.
 *
 * The data are closed forms, worked here and not taken from our own output:
 * - a rectangular box L x B x D floating at draft T: displacement rho L B T, LCB = L/2,
 *   block coefficient 1; a section immersed to height z has area B z (Bonjean curves of
 *   a box); every station has area B T (a flat sectional-area curve) (any
 *   naval-architecture text, e.g. E. C. Tupper, Introduction to Naval Architecture,
 *   5th ed. 2013, ch. 3; from memory);
 * - a horizontal circular cylinder of radius R about its axis: buoyancy acts through the
 *   axis at every heel, so KN = R sin(heel) at every displacement (K on the bottom of the
 *   circle: geometry, no source needed);
 * - the wall-sided formula GZ = sin(phi) (GM + BM tan^2(phi) / 2), exact for a wall-sided
 *   hull until the deck edge immerses or the bilge emerges (C. B. Barrass and D. R.
 *   Derrett, Ship Stability for Masters and Mates, 7th ed. 2012, the chapter on the
 *   wall-sided formula; from memory); its slope at the origin is GM per radian.
 */
import { describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { fairnessWarnings } from '../../core/fairness/fairness.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { bonjeanPlot } from '../../core/plots/bonjeanPlot.js';
import { crossCurvesPlot } from '../../core/plots/crossCurvesPlot.js';
import { CURVES_OF_FORM_FIELDS, curvesOfFormPlot } from '../../core/plots/curvesOfFormPlot.js';
import { gzPlot, RADIAN_DEG } from '../../core/plots/gzPlot.js';
import { linesData } from '../../core/plots/linesData.js';
import { linesPlot } from '../../core/plots/linesPlot.js';
import { HULL_PLOTS } from '../../core/plots/plotCatalogue.js';
import { sectionalAreaPlot } from '../../core/plots/sectionalAreaPlot.js';
import type { CriterionVerdict as CriterionResult, GzCurve as GzResult } from '../../core/plots/stabilityShapes.js';
import { bonjean } from '../../core/upright/bonjean.js';
import { hydrostaticTable } from '../../core/upright/hydrostatics.js';
import { sectionalAreaCurve } from '../../core/upright/sectionalAreaCurve.js';
import { boxBarge, parabolicHull, planWedge } from '../fixtures/hulls.js';
import { all, attr, axisScale, hasVertex, num, parseSvg, pathVertices, textOf } from '../helpers/svgRead.js';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { wallSidedGz } from '../fixtures/wallSided.js';

const L = 10;
const B = 4;
const D = 2;
const RHO = 1.025;
const box = () => prepareHull(boxBarge(L, B, D, 11, 5));
const curve = (doc: ReturnType<typeof parseSvg>, name: string) => all(doc, 'path').filter((p) => attr(p, 'data-curve') === name);
const curvesStarting = (doc: ReturnType<typeof parseSvg>, prefix: string) => all(doc, 'path').filter((p) => attr(p, 'data-curve').startsWith(prefix));
const near = (a: number, b: number, tol = 0.05) => Math.abs(a - b) <= tol;

/** What every plot must carry: a title and description for screen readers, axis titles with units, the caution. */
function expectAccessibleFrame(svg: string): ReturnType<typeof parseSvg> {
  const doc = parseSvg(svg);
  const root = doc.documentElement!;
  expect(root.tagName).toBe('svg');
  expect(attr(root, 'role')).toBe('img');
  const [title] = all(doc, 'title');
  const [desc] = all(doc, 'desc');
  expect(textOf(title!).length).toBeGreaterThan(5);
  expect(textOf(desc!).length).toBeGreaterThan(40);
  expect(attr(root, 'aria-labelledby')).toBe(`${attr(title!, 'id')} ${attr(desc!, 'id')}`);
  const axisTitles = all(doc, 'text').filter((t) => attr(t, 'data-role') === 'axis-title').map(textOf);
  expect(axisTitles.length).toBeGreaterThanOrEqual(2);
  for (const t of axisTitles) expect(t).toMatch(/, (m|t|m²|degrees)\b|divisions/);
  const caution = all(doc, 'text').find((t) => attr(t, 'data-role') === 'caution')!;
  expect(all(caution, 'tspan').map(textOf).join(' ')).toBe(CAUTION);
  return doc;
}

describe('the lines', () => {
  test('a box barge: one section per station on its side of the body plan, offsets where the scales put them', () => {
    const p = box();
    const doc = expectAccessibleFrame(linesPlot(linesData(p, [])));
    // 11 stations; the one at amidships (x = 5) is drawn on both sides.
    expect(curvesStarting(doc, 'section x = ')).toHaveLength(12);
    // Waterlines above the keel (z = 0.5, 1, 1.5, 2), each one run from end to end.
    expect(curvesStarting(doc, 'waterline ')).toHaveLength(4);
    expect(curve(doc, 'keel')).toHaveLength(1);
    expect(curve(doc, 'deck edge')).toHaveLength(1);
    const sx = axisScale(doc, 'x', 0);
    const sz = axisScale(doc, 'y', 0);
    const sy = axisScale(doc, 'y', 1);
    // The body plan's axis is labelled with half-breadths both sides; read its forward half.
    const sb = axisScale(doc, 'x', 1, 'from-zero');
    const dots = all(doc, 'circle').filter((c) => attr(c, 'r') === '1.9').map((c) => [num(c, 'cx'), num(c, 'cy')] as const);
    // The offset y = B/2 at z = 1 of a forward station, in the body plan and in the plan.
    expect(dots.some(([x, y]) => near(x, sb(B / 2)) && near(y, sz(1)))).toBe(true);
    expect(dots.some(([x, y]) => near(x, sx(10)) && near(y, sy(B / 2)))).toBe(true);
    // The keel line runs along z = 0 from x = 0 to x = L.
    const keel = pathVertices(attr(curve(doc, 'keel')[0]!, 'd'));
    expect(hasVertex(keel, sx(0), sz(0))).toBe(true);
    expect(hasVertex(keel, sx(L), sz(0))).toBe(true);
    // True shape: one metre is as long across as it is along.
    expect(near(sx(1) - sx(0), sz(0) - sz(1), 0.02)).toBe(true);
    expect(textOf(all(doc, 'text').find((t) => attr(t, 'data-role') === 'fairness')!)).toBe('The fairness check reports no offset.');
  });

  test('a wedge in plan: the sections forward of amidships are drawn right of the centreline, those aft left', () => {
    // Half-breadth (B/2) x / L: each station's offsets are all at one half-breadth.
    const doc = parseSvg(linesPlot(linesData(prepareHull(planWedge(L, B, D, 11, 5)), [])));
    const sb = axisScale(doc, 'x', 1, 'from-zero');
    const sz = axisScale(doc, 'y', 0);
    const dots = all(doc, 'circle').filter((c) => attr(c, 'r') === '1.9').map((c) => [num(c, 'cx'), num(c, 'cy')] as const);
    const at = (y: number) => dots.some(([cx, cy]) => near(cx, y) && near(cy, sz(1)));
    for (const x of [1, 2, 3, 7, 8, 9]) {
      const y = (B / 2) * (x / L);
      const right = sb(y);
      const left = 2 * sb(0) - right;
      expect(at(right), `station x = ${x} on the right`).toBe(x > L / 2);
      expect(at(left), `station x = ${x} on the left`).toBe(x < L / 2);
    }
  });

  test('an offset moved off a fair hull is ringed and listed as the fairness check reports it', () => {
    const hull = parabolicHull(20, 6, 2, 3, 21, 11);
    const st = hull.stations[8]!;
    const j = 5;
    st.points[j] = { ...st.points[j]!, y: st.points[j]!.y + 0.06 * 6 };
    const warnings = fairnessWarnings(hull);
    expect(warnings.length).toBeGreaterThanOrEqual(1);
    const doc = parseSvg(linesPlot(linesData(prepareHull(hull), warnings)));
    const listed = all(doc, 'text').filter((t) => attr(t, 'data-role') === 'warning').map(textOf).join(' ');
    for (const w of warnings) expect(listed).toContain(w.message.split(' ').slice(0, 4).join(' '));
    const rings = all(doc, 'circle').filter((c) => attr(c, 'r') === '7');
    // Each warning is ringed in the profile, the body plan and (on a drawn waterline) the plan.
    expect(rings.length).toBeGreaterThanOrEqual(2 * warnings.length);
    const sx = axisScale(doc, 'x', 0);
    const sz = axisScale(doc, 'y', 0);
    const w = warnings[0]!;
    expect(rings.some((c) => near(num(c, 'cx'), sx(w.x)) && near(num(c, 'cy'), sz(w.z)))).toBe(true);
  });

  test('knuckles of a hard-chine hull are marked, and the chine drawn in profile and plan', () => {
    const file = fileURLToPath(new URL('../../offsets-demo/survey-launch.csv', import.meta.url));
    const hull = readOffsetsCsv(readFileSync(file, 'utf8')).hull;
    const doc = parseSvg(linesPlot(linesData(prepareHull(hull), [])));
    const knuckles = hull.stations.reduce((n, s) => n + s.points.slice(1, -1).filter((q) => q.knuckle).length, 0);
    expect(knuckles).toBeGreaterThan(0);
    // A square at each knuckle in the body plan (stations at amidships count twice), none elsewhere for a points-form table.
    const squares = all(doc, 'rect').filter((r) => attr(r, 'width') === '6' && attr(r, 'stroke') !== '');
    expect(squares.length).toBeGreaterThanOrEqual(knuckles);
    expect(curve(doc, 'knuckle line 1 in profile')).toHaveLength(1);
    expect(curve(doc, 'knuckle line 1 in plan')).toHaveLength(1);
  });
});

describe('the curves of form', () => {
  test('a box barge: one curve per particular, displacement on the straight line rho L B T at its stated scale', () => {
    const p = box();
    const drafts = [0.25, 0.5, 0.75, 1, 1.25, 1.5, 1.75, 2];
    const rows = hydrostaticTable(p, drafts, RHO);
    const doc = expectAccessibleFrame(curvesOfFormPlot({ name: 'box', density: RHO, rows }));
    for (const f of CURVES_OF_FORM_FIELDS) expect(curve(doc, f), f).toHaveLength(1);
    const key = all(doc, 'text').find((t) => attr(t, 'data-key') === 'displacement')!;
    const step = Number(/1 division = ([\d.]+) t/.exec(textOf(key))![1]);
    const sx = axisScale(doc, 'x');
    const sy = axisScale(doc, 'y');
    const v = pathVertices(attr(curve(doc, 'displacement')[0]!, 'd'));
    for (const T of drafts) expect(hasVertex(v, sx((RHO * L * B * T) / step), sy(T)), `draft ${T}`).toBe(true);
    // Cb = 1 for a box: the coefficients share the scale 0 to 1, so it runs up the last division.
    const cb = pathVertices(attr(curve(doc, 'cb')[0]!, 'd'));
    for (const T of drafts) expect(hasVertex(cb, sx(10), sy(T))).toBe(true);
  });
});

describe('the Bonjean and sectional-area curves', () => {
  test('a box barge: each station\'s area B z, set off from its station at the stated area scale', () => {
    const p = box();
    const doc = expectAccessibleFrame(bonjeanPlot({ name: 'box', stations: bonjean(p) }));
    expect(curvesStarting(doc, 'station x = ')).toHaveLength(11);
    const axisTitle = all(doc, 'text').find((t) => attr(t, 'data-role') === 'axis-title' && textOf(t).startsWith('x, m'))!;
    const perMetre = Number(/at ([\d.]+) m² of area per metre/.exec(textOf(axisTitle))![1]);
    const sx = axisScale(doc, 'x');
    const sz = axisScale(doc, 'y');
    for (const x of [0, 3, 7, 10]) {
      const v = pathVertices(attr(curve(doc, `station x = ${x}`)[0]!, 'd'));
      for (const z of [0, 0.5, 1, 1.5, 2]) expect(hasVertex(v, sx(x + (B * z) / perMetre), sz(z)), `x ${x}, z ${z}`).toBe(true);
    }
  });

  test('a box barge at draft T: a flat curve of height B T with the LCB at L/2', () => {
    const T = 1.2;
    const doc = expectAccessibleFrame(sectionalAreaPlot({ name: 'box', curve: sectionalAreaCurve(box(), T) }));
    expect(curve(doc, 'sectional area')).toHaveLength(1);
    const sx = axisScale(doc, 'x');
    const sa = axisScale(doc, 'y');
    const v = pathVertices(attr(curve(doc, 'sectional area')[0]!, 'd'));
    for (let x = 0; x <= L; x += 1) expect(hasVertex(v, sx(x), sa(B * T))).toBe(true);
    const lcb = all(doc, 'line').find((l) => attr(l, 'data-role') === 'lcb')!;
    expect(near(num(lcb, 'x1'), sx(L / 2))).toBe(true);
  });
});

describe('the cross curves', () => {
  test('a circular cylinder: one curve per heel, KN = R sin(heel) at every displacement', () => {
    const R = 1.5;
    const heels = [10, 20, 30, 45, 60, 75, 90];
    const displacements = [20, 40, 60, 80];
    const rows = heels.flatMap((heel) => displacements.map((displacement) => ({ displacement, heel, kn: R * Math.sin((heel * Math.PI) / 180) })));
    const doc = expectAccessibleFrame(crossCurvesPlot({ name: 'cylinder', rows }));
    for (const h of heels) expect(curve(doc, `heel ${h}`)).toHaveLength(1);
    expect(all(doc, 'path').filter((q) => attr(q, 'data-curve') !== '')).toHaveLength(heels.length);
    const sx = axisScale(doc, 'x');
    const sy = axisScale(doc, 'y');
    for (const h of heels) {
      const v = pathVertices(attr(curve(doc, `heel ${h}`)[0]!, 'd'));
      for (const d of displacements) expect(hasVertex(v, sx(d), sy(R * Math.sin((h * Math.PI) / 180)))).toBe(true);
    }
    expect(all(doc, 'text').map(textOf)).toContain('45°');
  });
});

describe('the GZ curve', () => {
  const GM = 0.6;
  const BM = 2.4;
  const wallSided = (deg: number) => wallSidedGz(GM, BM, deg);
  const points = Array.from({ length: 9 }, (_, k) => ({ heel: 5 * k, gz: wallSided(5 * k) }));
  const criteria: CriterionResult[] = [
    { id: 'gm0', required: 0.15, actual: GM, unit: 'm', pass: true },
    { id: 'gz-at-30', required: 0.2, actual: wallSided(30), unit: 'm', pass: wallSided(30) >= 0.2 },
    { id: 'angle-of-max-gz', required: 25, actual: 40, unit: 'deg', pass: true },
    { id: 'area-30-40', required: 0.03, actual: 0.01, unit: 'm.rad', pass: false },
  ];
  const result: GzResult = { gm0: GM, points, maxGz: wallSided(40), angleOfMaxGz: 40, vanishingAngle: null, downfloodingAngle: 35, criteria };

  test('GM0 is drawn as the tangent at the origin meeting the vertical at 57.3 degrees at height GM0', () => {
    const doc = expectAccessibleFrame(gzPlot({ name: 'wall-sided box', result, displacement: 100, kg: 1.2 }));
    const sx = axisScale(doc, 'x');
    const sy = axisScale(doc, 'y');
    const tangent = all(doc, 'line').find((l) => attr(l, 'data-role') === 'gm0-tangent')!;
    expect(near(num(tangent, 'x1'), sx(0)) && near(num(tangent, 'y1'), sy(0))).toBe(true);
    expect(near(num(tangent, 'x2'), sx(RADIAN_DEG)) && near(num(tangent, 'y2'), sy(GM))).toBe(true);
    expect(RADIAN_DEG).toBeCloseTo(57.2958, 4); // 180 / pi
    // The curve passes through the wall-sided values, and leaves the origin along the
    // tangent: GZ(1°) / (1° in radians) is within 0.1 % of GM.
    const v = pathVertices(attr(curve(doc, 'gz')[0]!, 'd'));
    for (const q of points) expect(hasVertex(v, sx(q.heel), sy(q.gz))).toBe(true);
    expect(Math.abs(wallSided(1) / (Math.PI / 180) - GM) / GM).toBeLessThan(0.001);
    const max = all(doc, 'circle').find((c) => attr(c, 'data-role') === 'max-gz')!;
    expect(near(num(max, 'cx'), sx(40)) && near(num(max, 'cy'), sy(wallSided(40)))).toBe(true);
    const df = all(doc, 'line').find((l) => attr(l, 'data-role') === 'downflooding')!;
    expect(near(num(df, 'x1'), sx(35))).toBe(true);
  });

  test('the criteria areas are shaded from 0 to 30 degrees and from 30 to the downflooding angle when it is below 40', () => {
    const doc = parseSvg(gzPlot({ name: 'wall-sided box', result }));
    const sx = axisScale(doc, 'x');
    const rect = (id: string) => all(doc, 'clipPath').find((c) => attr(c, 'id') === id)!.getElementsByTagName('rect')[0]!;
    const a = rect('hb-gz-clip-0-30');
    expect(near(num(a, 'x'), sx(0)) && near(num(a, 'x') + num(a, 'width'), sx(30))).toBe(true);
    const b = rect('hb-gz-clip-30-40');
    expect(near(num(b, 'x'), sx(30)) && near(num(b, 'x') + num(b, 'width'), sx(35))).toBe(true);
    expect(all(doc, 'path').filter((q) => ['area-0-30', 'area-30-40'].includes(attr(q, 'data-role')))).toHaveLength(2);
  });

  test('each verdict is written in words as well as coloured, and one failure makes the whole verdict a failure', () => {
    const doc = parseSvg(gzPlot({ name: 'wall-sided box', result }));
    for (const c of criteria) {
      const g = all(doc, 'g').find((e) => attr(e, 'data-criterion') === c.id)!;
      expect(attr(g, 'data-pass')).toBe(String(c.pass));
      expect(textOf(g)).toContain(c.pass ? 'pass' : 'FAIL');
    }
    const verdict = textOf(all(doc, 'text').find((t) => attr(t, 'data-role') === 'verdict')!);
    expect(verdict).toMatch(/^1 of 4 criteria FAIL/);
    const allPass = parseSvg(gzPlot({ name: 'x', result: { ...result, criteria: criteria.map((c) => ({ ...c, pass: true })) } }));
    expect(textOf(all(allPass, 'text').find((t) => attr(t, 'data-role') === 'verdict')!)).toBe('All 4 criteria pass.');
  });
});

describe('the catalogue', () => {
  test('every plot of a hull renders to a parseable SVG with its title, description and caution', () => {
    const p = box();
    // The box's displacement at 1 m and a KG well under its KMt: a loading it floats.
    const at1m = L * B * 1 * RHO;
    const params = { density: RHO, draft: 1, displacements: [0.5 * at1m, at1m], displacement: at1m, kg: 1 };
    for (const plot of HULL_PLOTS) expectAccessibleFrame(plot.render(p, params));
  });

  test('text from the offsets is escaped, so a hull name cannot break the SVG', () => {
    const hull = { ...boxBarge(L, B, D), name: 'a <b>&"c\'' };
    const doc = parseSvg(linesPlot(linesData(prepareHull(hull), [])));
    expect(textOf(all(doc, 'title')[0]!)).toBe('Lines: a <b>&"c\'');
  });
});
