/**
 * Printing an HTML document to PDF with a Chromium installed on the machine, run
 * headless as a child process (its own --print-to-pdf). No browser is downloaded: when
 * none is found the caller gets `undefined` and tells the person how to install one.
 */
import { execFile } from 'node:child_process';
import { existsSync } from 'node:fs';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

/**
 * Where a browser is looked for, in order, after the HALFBREADTH_BROWSER variable. First
 * Debian's chromium-headless-shell (the same Chromium without the desktop browser around
 * it: the demo report prints in about 1 s against nearly 3 s, with less than half the CPU,
 * to the same pages), by its program itself: its /usr/bin/chromium-headless-shell is a
 * script that runs the program as a child, which a timeout would not stop. Then a full
 * Chromium or Chrome. Both take the same flags (the shell, headless only, ignores
 * --headless=new).
 */
export const BROWSER_PATHS = [
  '/usr/lib/chromium/chromium-headless-shell', '/usr/bin/chromium', '/usr/bin/chromium-browser', '/usr/bin/google-chrome', '/usr/bin/google-chrome-stable',
] as const;

/** What to tell a person when no browser is found. */
export const INSTALL_BROWSER =
  'printing to PDF needs Chromium, and none was found (looked for HALFBREADTH_BROWSER, then ' +
  `${BROWSER_PATHS.join(', ')}). On Debian install it with: sudo apt-get install -y chromium-headless-shell ` +
  '(or chromium, or set HALFBREADTH_BROWSER to a Chromium or Chrome program). Without --pdf the report is written as HTML, which any browser prints.';

export function findBrowser(env: Readonly<Record<string, string | undefined>>): string | undefined {
  const own = env['HALFBREADTH_BROWSER'];
  if (own !== undefined && own !== '') return existsSync(own) ? own : undefined;
  return BROWSER_PATHS.find((p) => existsSync(p));
}

/** Flags for a headless run that asks no server of its own (no updates, no sync) and needs no GPU or sandbox helper. */
export const BROWSER_FLAGS = [
  '--headless=new', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run',
] as const;

/** The flags with a fresh profile folder of its own, so no state is shared with another run. */
export function browserFlags(profile: string): string[] {
  return [...BROWSER_FLAGS, `--user-data-dir=${profile}`];
}

/** Print `html` to the PDF file `out` with the browser at `browser`; the paper size is the document's own (@page size). */
export async function printPdf(browser: string, html: string, out: string): Promise<void> {
  const dir = await mkdtemp(join(tmpdir(), 'halfbreadth-pdf-'));
  try {
    const page = join(dir, 'report.html');
    await writeFile(page, html);
    const args = [...browserFlags(join(dir, 'profile')), '--no-pdf-header-footer', `--print-to-pdf=${resolve(out)}`, pathToFileURL(page).href];
    await new Promise<void>((done, failed) => {
      execFile(browser, args, { timeout: 120_000 }, (err, _stdout, stderr) => {
        if (err) failed(new Error(`${browser} could not print the report: ${err.message}${stderr ? `\n${String(stderr).slice(-2000)}` : ''}`));
        else done();
      });
    });
    if (!existsSync(resolve(out))) throw new Error(`${browser} ended without writing ${out}`);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}
