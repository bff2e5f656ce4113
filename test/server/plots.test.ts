/**
 * The plots, the report and the page over HTTP, through `inject`. Plumbing: the SVG of a
 * stored hull and of the same offsets posted are the core's plot of those offsets
 * (core/plots, itself held to closed forms in test/plots/plots.test.ts); the report
 * carries the sha256 of the upload, computed here with node:crypto (FIPS 180-4), and the
 * caution; the page and its files are served with the media types and the content
 * security policy they need (W3C CSP Level 3). Problems follow RFC 9457; ETags RFC 9110.
 */
import { createHash } from 'node:crypto';
import type { FastifyInstance } from 'fastify';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { prepareHull } from '../../core/hull/preparedHull.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { findHullPlot } from '../../core/plots/plotCatalogue.js';
import { buildApp } from '../../server/app.js';
import { boxCsv, csvHeaders, expectProblem, jsonHeaders } from '../fixtures/serverHelpers.js';
import { all, parseSvg, textOf } from '../helpers/svgRead.js';

const BOX = boxCsv('plot box', 10, 4, 2);
let app: FastifyInstance;
let id: string;

beforeAll(async () => {
  app = await buildApp();
  const res = await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: BOX });
  id = JSON.parse(res.body).id;
});
afterAll(async () => app.close());

const render = (name: string, params: { drafts?: number[]; draft?: number; density: number }) => findHullPlot(name)!.render(prepareHull(readOffsetsCsv(BOX).hull), params);

describe('plots', () => {
  test('a stored hull\'s plot is the core\'s SVG of its offsets, with an ETag that answers 304', async () => {
    const res = await app.inject({ url: `/v1/hulls/${id}/plots/curves-of-form.svg?drafts=0.5:0.5:2&density=1.000` });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe('image/svg+xml; charset=utf-8');
    expect(res.headers['content-security-policy']).toContain("default-src 'none'");
    expect(res.body).toBe(render('curves-of-form', { drafts: [0.5, 1, 1.5, 2], density: 1 }));
    expect(textOf(all(parseSvg(res.body), 'title')[0]!)).toBe('Curves of form: plot box');
    const again = await app.inject({ url: `/v1/hulls/${id}/plots/curves-of-form.svg?drafts=0.5:0.5:2&density=1.000`, headers: { 'if-none-match': String(res.headers.etag) } });
    expect(again.statusCode).toBe(304);
  });

  test('posted offsets, as CSV or as a JSON model, give the same plot as the stored hull', async () => {
    const stored = await app.inject({ url: `/v1/hulls/${id}/plots/sectional-areas.svg?draft=1.2` });
    const posted = await app.inject({ method: 'POST', url: '/v1/plots/sectional-areas.svg?draft=1.2', headers: csvHeaders, payload: BOX });
    expect(posted.statusCode).toBe(200);
    expect(posted.body).toBe(stored.body);
    const model = JSON.parse((await app.inject({ url: `/v1/hulls/${id}` })).body).offsets;
    const json = await app.inject({ method: 'POST', url: '/v1/plots/lines.svg', headers: jsonHeaders, payload: { offsets: model } });
    expect(json.statusCode).toBe(200);
    expect(json.body).toBe(render('lines', { density: 1.025 }));
  });

  test('a plot that needs a draft says so, a draft outside the hull is 422, and bad offsets name their line and column', async () => {
    expect(expectProblem(await app.inject({ url: `/v1/hulls/${id}/plots/sectional-areas.svg` }), 400).errors[0]!.message).toMatch(/draft/);
    expect(expectProblem(await app.inject({ url: `/v1/hulls/${id}/plots/sectional-areas.svg?draft=9` }), 422).errors[0]!.code).toBe('HYD_DRAFT_OUT_OF_RANGE');
    expectProblem(await app.inject({ url: `/v1/hulls/${id}/plots/lines.svg?draft=1` }), 400);
    expectProblem(await app.inject({ url: '/v1/hulls/nope/plots/lines.svg' }), 404);
    const bad = BOX.replace(/\n3,2,2,2,2,2\n/, '\n3,2,-2,2,2,2\n');
    expect(bad).not.toBe(BOX);
    const p = expectProblem(await app.inject({ method: 'POST', url: '/v1/plots/lines.svg', headers: csvHeaders, payload: bad }), 422);
    expect(p.errors[0]!.path).toEqual(['offsets', 7, 3]);
  });
});

describe('the report', () => {
  test('a stored hull\'s report is one HTML page with the upload\'s sha256, the caution and the chosen paper', async () => {
    const res = await app.inject({ url: `/v1/hulls/${id}/report?paper=letter` });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(res.body).toContain(createHash('sha256').update(BOX).digest('hex'));
    expect(res.body).toContain(CAUTION.replace(/'/g, '&#39;'));
    expect(res.body).toContain('size: letter portrait');
    // Self-contained: nothing is fetched from anywhere.
    expect(res.body).not.toMatch(/<script|<link|\bsrc=|url\(http/);
    expect((await app.inject({ url: `/v1/hulls/${id}/report` })).body).toContain('size: A4 portrait');
    expectProblem(await app.inject({ url: `/v1/hulls/${id}/report?paper=legal` }), 400);
  });

  test('posted offsets get a report with the body\'s sha256', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/report', headers: csvHeaders, payload: BOX });
    expect(res.statusCode).toBe(200);
    expect(res.body).toContain(createHash('sha256').update(BOX).digest('hex'));
  });
});

describe('the page', () => {
  test('/ is the page, with its script and style served here and a policy that lets it load nothing else', async () => {
    const page = await app.inject({ url: '/' });
    expect(page.statusCode).toBe(200);
    expect(page.headers['content-type']).toBe('text/html; charset=utf-8');
    const csp = String(page.headers['content-security-policy']);
    expect(csp).toContain("default-src 'none'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("connect-src 'self'");
    expect(page.body).toContain(CAUTION.replace(/'/g, '&#39;'));
    expect(page.body).toContain('<script type="module" src="/assets/page.js">');
    expect(page.body).not.toMatch(/https?:\/\//);
    const js = await app.inject({ url: '/assets/page.js' });
    expect(js.headers['content-type']).toBe('text/javascript; charset=utf-8');
    expect(js.body).not.toMatch(/https?:\/\//);
    const css = await app.inject({ url: '/assets/page.css' });
    expect(css.headers['content-type']).toBe('text/css; charset=utf-8');
  });
});
