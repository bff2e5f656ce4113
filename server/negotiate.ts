/**
 * Choosing JSON or CSV for an answer: `format=` in the query wins, else the Accept
 * header (RFC 9110, 12.5.1: media ranges with q-values, the more specific range
 * deciding), else JSON. Spreadsheets' web queries send `*\/*` or nothing, so a URL for
 * them carries `format=csv`.
 */
import type { FastifyRequest } from 'fastify';
import { serviceFail } from './serviceErrors.js';
import type { Format } from './requestFields.js';

const MEDIA: Readonly<Record<Format, string>> = { json: 'application/json', csv: 'text/csv' };

interface Range {
  type: string;
  subtype: string;
  q: number;
}

function ranges(accept: string): Range[] {
  const out: Range[] = [];
  for (const part of accept.split(',').slice(0, 50)) {
    const [media, ...params] = part.trim().split(';');
    const [type, subtype] = (media ?? '').trim().toLowerCase().split('/');
    if (type === undefined || subtype === undefined || type === '' || subtype === '') continue;
    let q = 1;
    for (const p of params) {
      const m = /^\s*q\s*=\s*([0-9.]+)\s*$/i.exec(p);
      if (m) q = Math.min(1, Math.max(0, Number(m[1]) || 0));
    }
    out.push({ type, subtype, q });
  }
  return out;
}

/** The q-value the header gives a media type: that of the most specific matching range. */
function quality(rs: readonly Range[], media: string): number {
  const [type, subtype] = media.split('/');
  let best = -1;
  let q = 0;
  for (const r of rs) {
    const rank = r.type === type && r.subtype === subtype ? 2 : r.type === type && r.subtype === '*' ? 1 : r.type === '*' && r.subtype === '*' ? 0 : -1;
    if (rank > best) {
      best = rank;
      q = r.q;
    }
  }
  return best < 0 ? 0 : q;
}

/** The form of the answer; 406 when the client accepts none of those `offered`. */
export function chooseFormat(req: FastifyRequest, format: Format | undefined, offered: readonly Format[] = ['json', 'csv']): Format {
  if (format !== undefined) {
    if (!offered.includes(format)) serviceFail('HYD_NOT_ACCEPTABLE', ['format'], `this route answers in ${offered.join(' or ')}, not ${format}`);
    return format;
  }
  const accept = req.headers.accept;
  if (accept === undefined || accept.trim() === '') return offered[0]!;
  const rs = ranges(accept);
  let chosen: Format | undefined;
  let bestQ = 0;
  for (const f of offered) {
    const q = quality(rs, MEDIA[f]);
    if (q > bestQ) {
      bestQ = q;
      chosen = f;
    }
  }
  if (chosen === undefined) {
    serviceFail('HYD_NOT_ACCEPTABLE', ['headers', 'accept'], `this route answers in ${offered.map((f) => MEDIA[f]).join(' or ')}; the Accept header allows neither`);
  }
  return chosen;
}

export const CSV_MEDIA_TYPE = 'text/csv; charset=utf-8; header=present';
export const JSON_MEDIA_TYPE = 'application/json; charset=utf-8';
export const TEXT_MEDIA_TYPE = 'text/plain; charset=utf-8';
