/**
 * The API page: plain HTML listing the routes, their parameters and answers, made from
 * the OpenAPI document, and a page for each problem type. Everything shown is escaped.
 */
import { CAUTION } from '../core/common/caution.js';
import { PROBLEM_CODES, STATUS_OF_CODE, problemSlug, problemTitle, problemType } from './problem.js';
import type { ProblemCode } from './serviceErrors.js';

type Json = Record<string, unknown>;

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

const STYLE = 'body{font:15px/1.5 system-ui,sans-serif;max-width:60rem;margin:2rem auto;padding:0 1rem;color:#1d2430}' +
  'code{background:#eef1f5;padding:0 .25rem}h2{border-top:1px solid #ccd;padding-top:1rem}table{border-collapse:collapse}' +
  'td,th{border:1px solid #ccd;padding:.2rem .5rem;text-align:left;vertical-align:top}.caution{border-left:4px solid #b60;padding:.5rem 1rem;background:#fff6ea}';

function page(title: string, body: string): string {
  return `<!doctype html>\n<html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(title)}</title><style>${STYLE}</style></head>` +
    `<body><h1>${escapeHtml(title)}</h1><p class="caution">${escapeHtml(CAUTION)}</p>${body}</body></html>\n`;
}

export function docsHtml(doc: Json): string {
  const paths = (doc.paths ?? {}) as Record<string, Record<string, Json>>;
  const parts: string[] = [`<p>${escapeHtml(String((doc.info as Json | undefined)?.description ?? ''))}</p>`, '<p>The machine-readable document: <a href="/openapi.json">/openapi.json</a>.</p>'];
  for (const [path, ops] of Object.entries(paths)) {
    for (const [method, op] of Object.entries(ops)) {
      parts.push(`<h2><code>${escapeHtml(method.toUpperCase())} ${escapeHtml(path)}</code></h2><p><b>${escapeHtml(String(op.summary))}</b>. ${escapeHtml(String(op.description))}</p>`);
      const params = (op.parameters ?? []) as Json[];
      if (params.length > 0) {
        const rows = params.map((p) => `<tr><td><code>${escapeHtml(String(p.name))}</code></td><td>${escapeHtml(String(p.in))}${p.required ? ', required' : ''}</td><td>${escapeHtml(String(p.description ?? ''))}</td></tr>`);
        parts.push(`<table><tr><th>parameter</th><th>in</th><th>meaning</th></tr>${rows.join('')}</table>`);
      }
      const body = op.requestBody as Json | undefined;
      if (body !== undefined) parts.push(`<p>Body: ${Object.keys((body.content ?? {}) as Json).map((t) => `<code>${escapeHtml(t)}</code>`).join(' or ')}.</p>`);
      const statuses = Object.entries((op.responses ?? {}) as Record<string, Json>).map(([s, r]) => `<code>${escapeHtml(s)}</code> ${escapeHtml(String(r.description))}`);
      parts.push(`<p>Answers: ${statuses.join('; ')}.</p>`);
    }
  }
  parts.push('<h2>Problem types</h2><table><tr><th>type</th><th>status</th><th>meaning</th></tr>' +
    PROBLEM_CODES.map((c) => `<tr><td><a href="${problemType(c)}"><code>${problemType(c)}</code></a></td><td>${STATUS_OF_CODE[c]}</td><td>${escapeHtml(problemTitle(c))}</td></tr>`).join('') + '</table>');
  return page('Halfbreadth API', parts.join('\n'));
}

export function problemHtml(code: ProblemCode): string {
  return page(`Problem: ${problemSlug(code)}`,
    `<p>${escapeHtml(problemTitle(code))}</p><p>HTTP status <code>${STATUS_OF_CODE[code]}</code>; error code <code>${code}</code>.</p>` +
    '<p>The problem document\'s <code>errors</code> name each issue: <code>path</code> gives <code>["offsets", line, column]</code> for an offsets file, the field path for JSON and query values.</p><p><a href="/docs">All routes</a></p>');
}
