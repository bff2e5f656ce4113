/**
 * Body parsers: an offsets file as `text/csv`, or JSON as `application/json`, both kept
 * as the bytes that arrived (the store keeps uploads byte for byte) beside their text.
 * Every other media type is refused with 415 by Fastify itself; a charset other than
 * UTF-8 is refused here.
 */
import { isUtf8 } from 'node:buffer';
import type { FastifyInstance, FastifyRequest } from 'fastify';
import { fail } from '../../core/common/errors.js';
import { serviceFail } from '../serviceErrors.js';
import { jsonErrorOffset, lineColumn } from '../jsonSyntax.js';

export type UploadBody =
  | { readonly mediaType: 'text/csv'; readonly bytes: Buffer; readonly text: string }
  | { readonly mediaType: 'application/json'; readonly bytes: Buffer; readonly text: string };

const CSV_TYPE = 'text/csv';
const JSON_TYPE = 'application/json';

function checkCharset(req: FastifyRequest): void {
  const header = req.headers['content-type'] ?? '';
  const m = /;\s*charset\s*=\s*"?([^";\s]+)"?/i.exec(header);
  const charset = m?.[1]?.toLowerCase();
  if (charset !== undefined && charset !== 'utf-8' && charset !== 'utf8' && charset !== 'us-ascii') {
    serviceFail('HYD_MEDIA_TYPE', ['headers', 'content-type'], `charset ${charset.slice(0, 40)} is not taken; send the body as UTF-8`);
  }
}

/** The first byte that is not part of well-formed UTF-8 (RFC 3629), as a line and column of the text before it. */
function badUtf8Place(bytes: Buffer): { line: number; column: number } {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i]!;
    const n = b < 0x80 ? 1 : b >= 0xc2 && b < 0xe0 ? 2 : b >= 0xe0 && b < 0xf0 ? 3 : b >= 0xf0 && b < 0xf5 ? 4 : 0;
    if (n === 0 || i + n > bytes.length || !isUtf8(bytes.subarray(i, i + n))) break;
    i += n;
  }
  const before = bytes.subarray(0, i).toString('utf8');
  return lineColumn(before, before.length);
}

/** UTF-8 text of a body; `where` is the first element of an issue's path. */
function utf8(bytes: Buffer, where: 'offsets' | 'body', code: 'HYD_CSV_UNREADABLE' | 'HYD_BODY_UNREADABLE'): string {
  if (!isUtf8(bytes)) {
    const { line, column } = badUtf8Place(bytes);
    const message = `line ${line}, column ${column}: the body is not UTF-8 text; save the file as UTF-8`;
    if (code === 'HYD_CSV_UNREADABLE') fail(code, [where, line, column], message);
    serviceFail(code, [where, line, column], message);
  }
  const text = bytes.toString('utf8');
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

/**
 * The value of a JSON body's text. Parsed where the body is used, not as it arrives, so
 * that a large body is parsed in a worker thread (server/jobs/) rather than on the
 * request thread.
 */
export function parseJsonText(text: string): unknown {
  if (text.trim() === '') serviceFail('HYD_BODY_UNREADABLE', ['body'], 'the body is empty; send a JSON object');
  try {
    return JSON.parse(text);
  } catch {
    const at = jsonErrorOffset(text);
    const { line, column } = lineColumn(text, at < 0 ? text.length : at);
    const found = at >= text.length || at < 0 ? 'the text ends too soon' : `unexpected ${JSON.stringify(text.slice(at, at + 12))}`;
    serviceFail('HYD_BODY_UNREADABLE', ['body', line, column], `line ${line}, column ${column}: the body is not valid JSON (${found})`);
  }
}

export function registerUploadBody(app: FastifyInstance): void {
  app.removeAllContentTypeParsers();
  app.addContentTypeParser(CSV_TYPE, { parseAs: 'buffer' }, (req, body, done) => {
    try {
      checkCharset(req);
      const bytes = body as Buffer;
      done(null, { mediaType: CSV_TYPE, bytes, text: utf8(bytes, 'offsets', 'HYD_CSV_UNREADABLE') } satisfies UploadBody);
    } catch (e) {
      done(e as Error, undefined);
    }
  });
  app.addContentTypeParser(JSON_TYPE, { parseAs: 'buffer' }, (req, body, done) => {
    try {
      checkCharset(req);
      const bytes = body as Buffer;
      done(null, { mediaType: JSON_TYPE, bytes, text: utf8(bytes, 'body', 'HYD_BODY_UNREADABLE') } satisfies UploadBody);
    } catch (e) {
      done(e as Error, undefined);
    }
  });
}

/** The body of a request that must carry one. */
export function uploadOf(req: FastifyRequest): UploadBody {
  const body = req.body as UploadBody | undefined;
  if (body === undefined || body === null) {
    serviceFail('HYD_BODY_UNREADABLE', ['body'], 'the request has no body; send an offsets file as text/csv or a JSON object as application/json');
  }
  return body;
}
