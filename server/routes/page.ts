/**
 * The page at `/` and its two files, served by the service itself (web/index.html,
 * web/page.js, web/page.css), so the page needs no network but this service and no
 * build step. The page is a client of the API: it computes nothing itself.
 */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { z } from 'zod';
import { CAUTION } from '../../core/common/caution.js';
import { escapeHtml } from '../docsPage.js';
import type { RouteSpec } from './routeSpec.js';

/** The page may load its own script and style and ask this service, nothing else. */
const PAGE_POLICY = "default-src 'none'; script-src 'self'; style-src 'self'; connect-src 'self'; img-src 'self' data: blob:; base-uri 'none'; form-action 'none'; frame-ancestors 'none'";

/** The project's root: the nearest folder above this module with a package.json (from server/routes/ or dist/server/routes/). */
function projectRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  while (!existsSync(join(dir, 'package.json'))) {
    const up = dirname(dir);
    if (up === dir) throw new Error('cannot find the project folder (package.json) above server/routes/page');
    dir = up;
  }
  return dir;
}

const files = new Map<string, string>();
/** A file of web/, read once. */
function webFile(name: string): string {
  let text = files.get(name);
  if (text === undefined) {
    text = readFileSync(join(projectRoot(), 'web', name), 'utf8');
    if (name === 'index.html') text = text.replace('__CAUTION__', escapeHtml(CAUTION));
    files.set(name, text);
  }
  return text;
}

const NoQuery = z.object({}).passthrough();

function asset(url: string, name: string, mediaType: string, summary: string): RouteSpec {
  return {
    method: 'GET',
    url,
    operationId: `page${name.replace(/\W+(\w)/g, (_m, c: string) => c.toUpperCase()).replace(/^\w/, (c) => c.toUpperCase())}`,
    tag: 'service',
    summary,
    description: `${summary}: a file of the page at /, served by the service so the page needs no other network.`,
    query: NoQuery,
    responses: { 200: { description: summary, other: { mediaType, description: summary } } },
    problems: [],
    handler: (_req, reply) => reply.type(`${mediaType}; charset=utf-8`).header('cache-control', 'no-cache').send(webFile(name)),
  };
}

export const PAGE_ROUTES: readonly RouteSpec[] = [
  {
    method: 'GET',
    url: '/',
    operationId: 'page',
    tag: 'service',
    summary: 'The page',
    description: 'A page for people: pick a stored hull or drop an offsets file, and see its particulars, errors or fairness warnings, lines, hydrostatic table and curves, calculation sheet and downloads of each table (CSV) and plot (SVG).',
    query: NoQuery,
    responses: { 200: { description: 'the page', other: { mediaType: 'text/html', description: 'HTML' } } },
    problems: [],
    handler: (_req, reply) => reply.type('text/html; charset=utf-8').header('content-security-policy', PAGE_POLICY).header('cache-control', 'no-cache').send(webFile('index.html')),
  },
  asset('/assets/page.js', 'page.js', 'text/javascript', 'The page\'s script'),
  asset('/assets/page.css', 'page.css', 'text/css', 'The page\'s style'),
];
