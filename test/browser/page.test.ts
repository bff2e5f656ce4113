/// <reference lib="dom" />
/// <reference lib="dom.iterable" />
/**
 * The page at / and the printed report in a real browser, Debian's Chromium (installed
 * by .ci/run when missing; never a downloaded build). The page is driven by
 * playwright-core in Debian's chromium-headless-shell, the same Chromium without the
 * desktop browser around it (about half the CPU of /usr/bin/chromium for the same pages),
 * or in /usr/bin/chromium where that package is not installed: one browser for the whole
 * file, with a fresh profile. `halfbreadth report --pdf` prints with the browser it finds
 * itself, as on a user's machine (the same shell, first in its list).
 *
 * What is checked, and against what:
 * - the volume the page shows at a draft is the API's (the same service answers both;
 *   the API's figures are held to closed forms in test/upright/ and test/server/);
 * - a dropped file with a negative half-breadth shows the problem with its line and
 *   column, as the offsets reader names them;
 * - a downloaded CSV is byte for byte the API's CSV for the same drafts;
 * - the controls are reached with the Tab key in reading order and work from the keyboard;
 * - at 390 px nothing but the tables and plots (which scroll in their own boxes) is
 *   wider than the screen;
 * - the report printed to PDF (A4 through the browser's print, US letter through
 *   `halfbreadth report --pdf`) has the caution on every page: pages and cautions are
 *   counted in the PDF's text, read with pdf.js (pdfjs-dist), and the page size is
 *   ISO 216 A4 (210 x 297 mm = 595.3 x 841.9 pt) or ANSI letter (8.5 x 11 in = 612 x 792 pt).
 * Screenshots at 1280 and 390 px are saved under test-artifacts/ to be looked at.
 */
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { FastifyInstance } from 'fastify';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import type { CliIo } from '../../cli/io.js';
import { main } from '../../cli/main.js';
import { BROWSER_FLAGS } from '../../cli/printPdf.js';
import { buildApp } from '../../server/app.js';
import { preloadDemo } from '../../server/preloadDemo.js';
import { boxCsv } from '../fixtures/serverHelpers.js';

const CHROMIUM = '/usr/bin/chromium';
/**
 * The browser the page is driven in: the headless shell's program itself (Debian's
 * /usr/bin/chromium-headless-shell is a shell script that does not exec it, so a browser
 * stopped through the script would outlive it), else the full Chromium.
 */
const HEADLESS_SHELL = '/usr/lib/chromium/chromium-headless-shell';
const PAGE_BROWSER = existsSync(HEADLESS_SHELL) ? HEADLESS_SHELL : CHROMIUM;
/** The opening words of the caution, without white space. */
const CAUTION_START = CAUTION.slice(0, 60).replace(/\s+/g, '');
const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const ARTEFACTS = join(ROOT, 'test-artifacts');

let app: FastifyInstance;
let base: string;
let context: BrowserContext;
let profile: string;
/** The page's query that opens the small box. */
let small: string;

/**
 * `halfbreadth report --pdf` on the survey launch, in US letter. It starts its own
 * Chromium, so it is started first and runs while the page is tested in the other.
 */
async function printLetterPdf(): Promise<{ code: number; err: string; pdf: Uint8Array }> {
  const dir = mkdtempSync(join(tmpdir(), 'halfbreadth-pdf-test-'));
  try {
    const out = join(dir, 'report.pdf');
    let err = '';
    const io: CliIo = {
      stdout: { write: () => true, isTTY: false },
      stderr: { write: (t: string) => (err += t), isTTY: false },
      readStdin: async () => new Uint8Array(),
      readFile: async (p: string) => readFileSync(p),
      env: {},
    };
    const code = await main(['report', join(ROOT, 'offsets-demo', 'survey-launch.csv'), '--paper', 'letter', '--pdf', out], io);
    return { code, err, pdf: code === 0 ? new Uint8Array(readFileSync(out)) : new Uint8Array() };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
let letterPdf: Promise<{ code: number; err: string; pdf: Uint8Array }>;

beforeAll(async () => {
  letterPdf = printLetterPdf();
  // Its failure is the letter test's to report, not an unhandled rejection meanwhile.
  letterPdf.catch(() => undefined);
  mkdirSync(ARTEFACTS, { recursive: true });
  // Every computation on the request thread: the page only shows what the API answers,
  // and a worker thread would cost its start and the job code's loading (several hundred
  // ms of CPU) for the one cross-curves plot the demo workboat's page asks for. The
  // worker threads give the same answers (test/server/workerThreads.test.ts).
  app = await buildApp({ limits: { inlineWork: Number.POSITIVE_INFINITY } });
  preloadDemo(app.halfbreadth.store, join(ROOT, 'offsets-demo'));
  base = await app.listen({ port: 0, host: '127.0.0.1' });
  // A small hull for the tests that need a page shown but not a particular hull.
  const stored = await fetch(`${base}/v1/hulls?name=small%20box`, { method: 'POST', headers: { 'content-type': 'text/csv' }, body: boxCsv('small box', 10, 4, 2) });
  small = `?hull=${((await stored.json()) as { id: string }).id}`;
  profile = mkdtempSync(join(tmpdir(), 'halfbreadth-browser-'));
  // Signals are the test runner's to handle: playwright-core is not to install handlers of its own in this worker.
  context = await chromium.launchPersistentContext(profile, {
    executablePath: PAGE_BROWSER,
    headless: true,
    // The headless shell is headless only and takes no --headless=new.
    args: PAGE_BROWSER === CHROMIUM ? [...BROWSER_FLAGS] : BROWSER_FLAGS.filter((f) => !f.startsWith('--headless')),
    viewport: { width: 1280, height: 900 },
    acceptDownloads: true,
    handleSIGINT: false,
    handleSIGTERM: false,
    handleSIGHUP: false,
  });
});

afterAll(async () => {
  await context?.close();
  await app?.close();
  if (profile) rmSync(profile, { recursive: true, force: true });
});

/** Open the page and wait until it has shown a hull (the first stored one, without a click). */
async function openPage(width: number, height: number, query = ''): Promise<Page> {
  const page = await context.newPage();
  await page.setViewportSize({ width, height });
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  await page.goto(`${base}/${query}`);
  await expect.poll(() => page.locator('#status').textContent(), { timeout: 20_000 }).toMatch(/^Showing /);
  expect(errors).toEqual([]);
  return page;
}

/** Pages, cautions per page, and the size of the first page (pt) of a PDF, read with pdf.js. */
async function readPdf(bytes: Uint8Array): Promise<{ pages: number; cautions: number[]; size: [number, number] }> {
  const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await pdfjs.getDocument({ data: bytes, verbosity: 0 }).promise;
  const cautions: number[] = [];
  let size: [number, number] = [0, 0];
  for (let i = 1; i <= doc.numPages; i++) {
    const page = await doc.getPage(i);
    if (i === 1) size = [page.view[2]!, page.view[3]!];
    // Compared without white space: pdf.js gives a line's text in pieces, and where the
    // pieces meet says nothing of the words.
    const text = (await page.getTextContent()).items.map((it) => ('str' in it ? it.str : '')).join('').replace(/\s+/g, '');
    cautions.push(text.split(CAUTION_START).length - 1);
  }
  await doc.destroy();
  return { pages: doc.numPages, cautions, size };
}

describe('the page in a browser', () => {
  test('shows the demo workboat: the volume at a draft is the API\'s, the lines and curves are drawn (1280 px)', async () => {
    const page = await openPage(1280, 900, '?hull=demo-workboat');
    expect(await page.inputValue('#hull-select')).toBe('demo-workboat');
    const from = await page.inputValue('#draft-from');
    const step = await page.inputValue('#draft-step');
    const to = await page.inputValue('#draft-to');
    const api = (await (await fetch(`${base}/v1/hulls/demo-workboat/hydrostatics?drafts=${from}:${step}:${to}`)).json()) as { rows: { draft: number; volume: number }[] };
    const row = api.rows[Math.floor(api.rows.length / 2)]!;
    const shown = await page.locator('#hydro-table tbody tr').nth(Math.floor(api.rows.length / 2)).locator('td[data-field="volume"]').textContent();
    expect(shown).toBe(row.volume.toFixed(3));
    for (const fig of ['#lines-figure', '#curves-figure', '#bonjean-figure', '#areas-figure']) {
      await expect.poll(() => page.locator(`${fig} svg title`).count()).toBe(1);
    }
    await page.screenshot({ path: join(ARTEFACTS, 'page-1280.png'), fullPage: false });
    await page.locator('#lines-section').scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(ARTEFACTS, 'page-1280-lines.png'), fullPage: false });
    await page.locator('#hydro-section h3').first().scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(ARTEFACTS, 'page-1280-curves.png'), fullPage: false });

    // The table downloaded as CSV is the API's CSV for the same drafts.
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('#download-hydro-csv')]);
    const saved = readFileSync((await download.path())!, 'utf8');
    expect(saved).toBe(await (await fetch(`${base}/v1/hulls/demo-workboat/hydrostatics?drafts=${from}:${step}:${to}&format=csv`)).text());
    expect(download.suggestedFilename()).toBe('demo-workboat-hydrostatics.csv');
    // And a plot as SVG.
    const [svg] = await Promise.all([page.waitForEvent('download'), page.click('[data-download-svg="lines-figure"]')]);
    expect(readFileSync((await svg.path())!, 'utf8')).toBe(await (await fetch(`${base}/v1/hulls/demo-workboat/plots/lines.svg`)).text());
    await page.close();
  });

  test('the controls are reached with Tab in reading order and work from the keyboard', async () => {
    const page = await openPage(1280, 900, small);
    await page.locator('body').focus();
    // Each element that takes the focus is noted by the page itself, so the keys go in one stream.
    await page.evaluate(() => {
      const seen: string[] = [];
      (window as unknown as { focusOrder: string[] }).focusOrder = seen;
      document.addEventListener('focusin', (e) => {
        const a = e.target as HTMLElement;
        seen.push(a.id || a.getAttribute('href') || a.textContent?.trim().slice(0, 30) || a.tagName);
      });
    });
    for (let k = 0; k < 16; k++) await page.keyboard.press('Tab');
    const order = await page.evaluate(() => (window as unknown as { focusOrder: string[] }).focusOrder);
    // Every control has a label a screen reader reads, and every table header its scope.
    const unlabelled = await page.evaluate(() => Array.from(document.querySelectorAll('input, select')).filter((e) => (e as HTMLInputElement).labels?.length === 0).map((e) => e.id));
    expect(unlabelled).toEqual([]);
    expect(await page.locator('#hydro-table th:not([scope])').count()).toBe(0);
    expect(await page.locator('h1').count()).toBe(1);
    const wanted = ['#main', 'hull-select', 'show-hull', 'file-input', 'draft-from', 'draft-step', 'draft-to', 'density', 'compute-table'];
    const positions = wanted.map((w) => order.indexOf(w));
    expect(positions.every((p) => p >= 0), `focus went ${order.join(' > ')}`).toBe(true);
    expect([...positions].sort((a, b) => a - b)).toEqual(positions);
    // From the keyboard alone: a draft typed into the sheet's field and Enter shows that sheet.
    await page.focus('#sheet-draft');
    await page.keyboard.press('Control+A');
    await page.keyboard.type('1.25');
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('#sheet-caption').textContent()).toContain('at draft 1.25 m');
    await page.close();
  });

  test('a dropped file with an error shows it with its line and column; a sound file chosen next is shown', async () => {
    const page = await openPage(1280, 900, small);
    // The demo workboat with one half-breadth made negative: the first given one, at a
    // waterline column (a numeric header), of the fifth station.
    const lines = readFileSync(join(ROOT, 'offsets-demo', 'workboat.csv'), 'utf8').split('\n');
    const headerAt = lines.findIndex((l) => l.startsWith('x,'));
    const header = lines[headerAt]!.split(',');
    const line = headerAt + 1 + 5;
    const cells = lines[line - 1]!.split(',');
    const column = cells.findIndex((c, k) => k > 0 && c !== '' && Number(header[k]) >= 0 && Number(c) > 0) + 1;
    expect(column).toBeGreaterThan(1);
    cells[column - 1] = `-${cells[column - 1]}`;
    lines[line - 1] = cells.join(',');
    const bad = lines.join('\n');
    await page.evaluate((text) => {
      const dt = new DataTransfer();
      dt.items.add(new File([text], 'bad.csv', { type: 'text/csv' }));
      document.getElementById('drop-zone')!.dispatchEvent(new DragEvent('drop', { dataTransfer: dt, bubbles: true, cancelable: true }));
    }, bad);
    await expect.poll(() => page.locator('#problems li').first().textContent()).toContain(`line ${line}, column ${column}`);
    expect(await page.locator('#problems').getAttribute('role')).toBe('alert');
    expect(await page.locator('#lines-section').isHidden()).toBe(true);
    // A sound file in the points form, chosen with the file control: shown from the posted offsets.
    await page.setInputFiles('#file-input', join(ROOT, 'offsets-demo', 'survey-launch.csv'));
    await expect.poll(() => page.locator('#status').textContent(), { timeout: 20_000 }).toMatch(/^Showing Kestrow Plover/);
    expect(await page.locator('#lines-figure svg title').textContent()).toMatch(/^Lines: Kestrow Plover/);
    expect(await page.locator('#problems li').count()).toBe(0);
    await page.close();
  });

  test('a loading: the verdicts and the floating position shown are the API\'s, the GZ curve and cross curves are drawn', async () => {
    const page = await openPage(1280, 900, '?hull=demo-survey-launch');
    await expect.poll(() => page.locator('#cross-figure svg title').count(), { timeout: 20_000 }).toBe(1);
    const displacement = await page.inputValue('#load-displacement');
    expect(Number(displacement)).toBeGreaterThan(0);
    await page.fill('#load-kg', '0.9');
    await page.fill('#load-lcg', '3.3');
    await page.fill('#load-fsm', '0.2');
    await page.click('#check-loading');
    await expect.poll(() => page.locator('#gz-figure svg title').count(), { timeout: 20_000 }).toBe(1);
    const query = `displacement=${displacement}&kg=0.9&fsm=0.2&trim=free&density=1.025`;
    const api = (await (await fetch(`${base}/v1/hulls/demo-survey-launch/gz?${query}`)).json()) as { gm0: number; criteria: { id: string; actual: number; pass: boolean }[] };
    const rows = page.locator('#criteria-table tbody tr');
    expect(await rows.count()).toBe(api.criteria.length);
    for (const [k, c] of api.criteria.entries()) {
      const row = rows.nth(k);
      expect(await row.getAttribute('data-criterion')).toBe(c.id);
      expect(await row.locator('td').nth(1).textContent()).toContain(String(Number(c.actual.toPrecision(4))));
      expect(await row.locator('td').nth(2).textContent()).toBe(c.pass ? 'pass' : 'FAIL');
    }
    expect(await page.locator('#loading-results').textContent()).toContain(`${api.gm0.toFixed(3)} m`);
    const floated = (await (await fetch(`${base}/v1/hulls/demo-survey-launch/float?displacement=${displacement}&lcg=3.3&kg=0.9`)).json()) as { draftAft: number };
    expect(await page.locator('#loading-results').textContent()).toContain(`draft aft ${floated.draftAft.toFixed(3)} m`);
    // The caveats of the verdicts are shown with them.
    expect(await page.locator('#criteria-notes').textContent()).toMatch(/weather\) criterion .* is not checked/);
    await page.locator('#loading-section').screenshot({ path: join(ARTEFACTS, 'page-1280-stability.png') });
    // The GZ curve downloaded as CSV is the API's.
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('#download-gz-csv')]);
    expect(readFileSync((await download.path())!, 'utf8')).toBe(await (await fetch(`${base}/v1/hulls/demo-survey-launch/gz?${query}&format=csv`)).text());
    await page.close();
  });

  test('at 390 px only the tables and plots scroll sideways, in their own boxes', async () => {
    const page = await openPage(390, 844);
    const overflow = await page.evaluate(() => document.scrollingElement!.scrollWidth);
    expect(overflow).toBeLessThanOrEqual(390);
    await page.screenshot({ path: join(ARTEFACTS, 'page-390.png'), fullPage: false });
    await page.locator('#lines-section').scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(ARTEFACTS, 'page-390-lines.png'), fullPage: false });
    await page.close();
  });
});

describe('the report printed to PDF', () => {
  test('A4 through the browser\'s print: the caution on every page', async () => {
    const page = await context.newPage();
    await page.goto(`${base}/v1/hulls/${small.slice('?hull='.length)}/report`);
    const pdf = await page.pdf({ preferCSSPageSize: true });
    await page.close();
    const r = await readPdf(new Uint8Array(pdf));
    expect(r.pages).toBeGreaterThanOrEqual(3);
    for (const [k, n] of r.cautions.entries()) expect(n, `page ${k + 1}`).toBeGreaterThanOrEqual(1);
    expect(r.size[0]).toBeCloseTo(595.28, 0);
    expect(r.size[1]).toBeCloseTo(841.89, 0);
  });

  test('US letter through halfbreadth report --pdf: the caution on every page', async () => {
    const { code, err, pdf } = await letterPdf;
    expect(code, err).toBe(0);
    const r = await readPdf(pdf);
    expect(r.pages).toBeGreaterThanOrEqual(3);
    for (const [k, n] of r.cautions.entries()) expect(n, `page ${k + 1}`).toBeGreaterThanOrEqual(1);
    expect(r.size).toEqual([612, 792]);
  });
});
