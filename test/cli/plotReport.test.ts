/**
 * The plot and report commands, run in-process through `main(argv, io)` with fake
 * streams. Plumbing: the SVG written is the core's plot of the file (core/plots, held
 * to closed forms in test/plots/plots.test.ts); the report carries the sha256 of the
 * file's bytes, computed here with node:crypto (FIPS 180-4), and the caution. Printing
 * to PDF is tested with the browser in test/browser/page.test.ts; here, what happens
 * when no browser is installed.
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { findHullPlot, HULL_PLOTS } from '../../core/plots/plotCatalogue.js';
import { parseSvg } from '../helpers/svgRead.js';
import { runCli } from '../helpers/runCli.js';

const WORKBOAT = fileURLToPath(new URL('../../offsets-demo/workboat.csv', import.meta.url));

/** The command line in-process (test/helpers/runCli.ts), with the environment given. */
const run = (argv: string[], env: Record<string, string> = {}) => runCli(argv, { env });

describe('plot', () => {
  test('writes the core\'s SVG of each plot of the file', async () => {
    const prepared = prepareHull(readOffsetsCsv(readFileSync(WORKBOAT, 'utf8')).hull);
    const lines = await run(['plot', 'lines', WORKBOAT]);
    expect(lines.code).toBe(0);
    expect(lines.out).toBe(findHullPlot('lines')!.render(prepared, { density: 1.025 }));
    parseSvg(lines.out);
    const curves = await run(['plot', 'curves-of-form', WORKBOAT, '--drafts', '0.5:0.25:2', '--fresh']);
    expect(curves.out).toBe(findHullPlot('curves-of-form')!.render(prepared, { drafts: [0.5, 0.75, 1, 1.25, 1.5, 1.75, 2], density: 1 }));
    const areas = await run(['plot', 'sectional-areas', WORKBOAT, '--draft', '1.3']);
    expect(areas.out).toBe(findHullPlot('sectional-areas')!.render(prepared, { draft: 1.3, density: 1.025 }));
  });

  test('an unknown plot, a missing draft and an option the plot does not take are bad input, all reported at once', async () => {
    const unknown = await run(['plot', 'waterfall', WORKBOAT]);
    expect(unknown.code).toBe(2);
    expect(unknown.err).toContain(`the plots are ${HULL_PLOTS.map((p) => p.name).join(', ')}`);
    const r = await run(['plot', 'sectional-areas', WORKBOAT, '--drafts', '1,2']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('the sectional-areas plot needs --draft');
    expect(r.err).toContain('the sectional-areas plot takes no --drafts');
    expect((await run(['plot'])).err).toContain('missing <name>');
  });
});

describe('report', () => {
  test('writes one HTML document with the sha256 of the file\'s bytes, the caution and the paper size', async () => {
    const r = await run(['report', WORKBOAT, '--paper', 'letter']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^<!doctype html>/);
    expect(r.out).toContain(createHash('sha256').update(readFileSync(WORKBOAT)).digest('hex'));
    expect(r.out).toContain(CAUTION.replace(/'/g, '&#39;'));
    expect(r.out).toContain('size: letter portrait');
    expect((await run(['report', WORKBOAT, '--paper', 'legal'])).err).toContain("--paper 'legal' is not one of a4, letter");
  });

  test('--pdf without a browser says how to install one and exits 3, writing nothing', async () => {
    const r = await run(['report', WORKBOAT, '--pdf', '/tmp/never-written.pdf'], { HALFBREADTH_BROWSER: '/nonexistent/chromium' });
    expect(r.code).toBe(3);
    expect(r.out).toBe('');
    expect(r.err).toContain('apt-get install -y chromium');
  });
});
