/**
 * Problem documents (RFC 9457) and the one error handler of the service.
 *
 * Every failure, from core (HalfbreadthError) or from HTTP (ServiceError, Fastify's own
 * body and routing errors), leaves as `application/problem+json` with a stable `type`
 * per code, a `title` that does not change between occurrences, the `status`, a
 * `detail` in plain words and `errors` naming the line and column or the field of each
 * issue. The table from code to status below is the only one.
 *
 * `type` is the relative URI `/problems/<slug>` (`HYD_DRAFT_OUT_OF_RANGE` becomes
 * `/problems/draft-out-of-range`); the service answers a GET on it with a page that
 * says what the problem is.
 */
import type { FastifyError, FastifyInstance, FastifyReply, FastifyRequest } from 'fastify';
import { z } from 'zod';
import { CAUTION } from '../core/common/caution.js';
import { ERROR_CODES, HalfbreadthError, type ErrorCode } from '../core/common/errors.js';
import { SERVICE_CODES, ServiceError, type ProblemCode, type ProblemIssue } from './serviceErrors.js';

/** HTTP status of each code. 400: unreadable bodies and bad query values; 413: over the body limit or the hull-size limits of core/common/limits.ts; 422: input that reads but breaks a rule of a hull. */
export const STATUS_OF_CODE: Readonly<Record<ProblemCode, number>> = {
  HYD_CSV_UNREADABLE: 400,
  HYD_HEADER: 422,
  HYD_CELL_NOT_NUMBER: 422,
  HYD_CELL_NOT_FINITE: 422,
  HYD_HALF_BREADTH_NEGATIVE: 422,
  HYD_X_NOT_INCREASING: 422,
  HYD_Z_NOT_INCREASING: 422,
  HYD_BLANK_INSIDE_ROW: 422,
  HYD_KEEL_DECK: 422,
  HYD_STATION_TOO_FEW_POINTS: 422,
  HYD_TOO_FEW_STATIONS: 422,
  HYD_KNUCKLE_VALUE: 422,
  HYD_METADATA_UNKNOWN: 422,
  HYD_METADATA_VALUE: 422,
  HYD_UNITS_CONFLICT: 422,
  HYD_METADATA_PLACE: 422,
  HYD_PERPENDICULARS: 422,
  HYD_TOO_LARGE: 413,
  HYD_VALUE_RANGE: 422,
  HYD_NOT_IMMERSED: 422,
  HYD_LOAD_OUT_OF_RANGE: 422,
  HYD_ANGLE_RANGE: 422,
  HYD_DECK_NOT_GIVEN: 422,
  HYD_CRITERIA: 422,
  HYD_OPENING: 422,
  HYD_ROW_LENGTH: 422,
  HYD_MODEL_INVALID: 422,
  HYD_DRAFT_LIST: 400,
  HYD_DRAFT_OUT_OF_RANGE: 422,
  HYD_DENSITY: 400,
  HYD_BAD_ARGUMENT: 400,
  HYD_BODY_UNREADABLE: 400,
  HYD_BODY_TOO_LARGE: 413,
  HYD_MEDIA_TYPE: 415,
  HYD_NOT_ACCEPTABLE: 406,
  HYD_HULL_NOT_FOUND: 404,
  HYD_ROUTE_NOT_FOUND: 404,
  HYD_METHOD_NOT_ALLOWED: 405,
  HYD_ANSWER_TOO_LARGE: 422,
  HYD_PRECONDITION_FAILED: 412,
  HYD_BAD_REQUEST: 400,
  HYD_REQUEST_TIMEOUT: 408,
  HYD_HEADERS_TOO_LARGE: 431,
  HYD_BUSY: 503,
  HYD_COMPUTE_LIMIT: 503,
  HYD_INTERNAL: 500,
};

export const PROBLEM_MEDIA_TYPE = 'application/problem+json; charset=utf-8';

/** `HYD_DRAFT_OUT_OF_RANGE` -> `draft-out-of-range`. */
export function problemSlug(code: ProblemCode): string {
  return code.replace(/^HYD_/, '').toLowerCase().replace(/_/g, '-');
}

export function problemType(code: ProblemCode): string {
  return `/problems/${problemSlug(code)}`;
}

export function problemTitle(code: ProblemCode): string {
  return code in ERROR_CODES ? ERROR_CODES[code as ErrorCode] : SERVICE_CODES[code as keyof typeof SERVICE_CODES];
}

/** Every code of both catalogues, in catalogue order. */
export const PROBLEM_CODES = Object.keys(STATUS_OF_CODE) as ProblemCode[];

export function codeOfSlug(slug: string): ProblemCode | undefined {
  return PROBLEM_CODES.find((c) => problemSlug(c) === slug);
}

const PathSchema = z.array(z.union([z.string(), z.number().int()])).describe('where: ["offsets", line, column] for CSV, the field path for JSON and queries');

export const ProblemSchema = z
  .object({
    type: z.string().describe('URI of the kind of problem: /problems/<slug>, one per code'),
    title: z.string().describe('what the kind of problem is, the same for every occurrence'),
    status: z.number().int().describe('HTTP status'),
    detail: z.string().describe('this occurrence in plain words'),
    instance: z.string().describe('path of the request that failed'),
    requestId: z.string().describe('id of the request in the service log'),
    errors: z
      .array(
        z.object({
          code: z.string().describe('error code (docs/errors.md, docs/api.md)'),
          path: PathSchema,
          message: z.string().describe('the place and the rule broken, in plain words'),
        }),
      )
      .describe('every issue found, not just the first'),
    caution: z.string(),
  })
  .describe('an RFC 9457 problem document');

export type Problem = z.infer<typeof ProblemSchema>;

export function problemDocument(code: ProblemCode, issues: readonly ProblemIssue[], detail: string, req: FastifyRequest): Problem {
  return {
    type: problemType(code),
    title: problemTitle(code),
    status: STATUS_OF_CODE[code],
    detail,
    instance: req.url.split('?')[0] ?? req.url,
    requestId: String(req.id),
    errors: issues.map((i) => ({ code: i.code, path: [...i.path], message: i.message })),
    caution: CAUTION,
  };
}

/** Fastify's own errors, in our catalogue. */
function fromFastify(err: FastifyError): { code: ProblemCode; message: string } {
  switch (err.code) {
    case 'FST_ERR_CTP_BODY_TOO_LARGE':
      return { code: 'HYD_BODY_TOO_LARGE', message: SERVICE_CODES.HYD_BODY_TOO_LARGE };
    case 'FST_ERR_CTP_INVALID_MEDIA_TYPE':
      return { code: 'HYD_MEDIA_TYPE', message: 'the body must be text/csv (an offsets file) or application/json' };
    case 'FST_ERR_CTP_EMPTY_JSON_BODY':
      return { code: 'HYD_BODY_UNREADABLE', message: 'the body is empty' };
    case 'FST_ERR_CTP_INVALID_CONTENT_LENGTH':
      return { code: 'HYD_BODY_UNREADABLE', message: 'the body is not as long as its Content-Length says' };
    case 'FST_ERR_BAD_URL':
      return { code: 'HYD_BAD_ARGUMENT', message: 'the URL is malformed (bad percent-encoding)' };
    case 'FST_ERR_MAX_PARAM_LENGTH':
      return { code: 'HYD_ROUTE_NOT_FOUND', message: 'a segment of the path is too long for any id this service gives' };
    default:
      break;
  }
  const status = err.statusCode ?? 500;
  if (status === 413) return { code: 'HYD_BODY_TOO_LARGE', message: SERVICE_CODES.HYD_BODY_TOO_LARGE };
  if (status === 415) return { code: 'HYD_MEDIA_TYPE', message: err.message };
  if (status === 404) return { code: 'HYD_ROUTE_NOT_FOUND', message: err.message };
  if (status >= 400 && status < 500) return { code: 'HYD_BAD_ARGUMENT', message: err.message };
  return { code: 'HYD_INTERNAL', message: 'the service failed unexpectedly; the failure is logged' };
}

/**
 * Node's own answers, before any route: a request that is not HTTP (400), one whose
 * request line and headers are over maxHeaderSize (431), or one that did not arrive in
 * time (408). Fastify's `clientErrorHandler`: the socket gets a problem document and is
 * closed.
 */
export function clientErrorProblem(err: Error & { code?: string }, socket: import('node:net').Socket): void {
  if (err.code === 'ECONNRESET' || socket.destroyed) return;
  const [code, message]: [ProblemCode, string] =
    err.code === 'ERR_HTTP_REQUEST_TIMEOUT'
      ? ['HYD_REQUEST_TIMEOUT', 'the request line, headers and body did not all arrive within the time allowed (see README, Limits); the connection is closed']
      : err.code === 'HPE_HEADER_OVERFLOW'
        ? ['HYD_HEADERS_TOO_LARGE', `the request line and headers are longer than the limit (see README, Limits); a long drafts list can use ranges from:step:to`]
        : ['HYD_BAD_REQUEST', 'the request is not well-formed HTTP/1.1'];
  const status = STATUS_OF_CODE[code];
  const doc: Problem = {
    type: problemType(code),
    title: problemTitle(code),
    status,
    detail: message,
    instance: '',
    requestId: '',
    errors: [{ code, path: ['request'], message }],
    caution: CAUTION,
  };
  const body = JSON.stringify(doc);
  const reason = status === 408 ? 'Request Timeout' : status === 431 ? 'Request Header Fields Too Large' : 'Bad Request';
  if (socket.writable) {
    socket.write(
      `HTTP/1.1 ${status} ${reason}\r\nContent-Type: ${PROBLEM_MEDIA_TYPE}\r\nContent-Length: ${Buffer.byteLength(body)}\r\nConnection: close\r\n\r\n${body}`,
    );
  }
  socket.end();
}

/** Errors of Fastify's router (bad percent-encoding, an overlong path segment), which come before any route: Fastify's `frameworkErrors` option. */
export function frameworkProblem(err: FastifyError, req: FastifyRequest, reply: FastifyReply): void {
  const { code, message } = fromFastify(err);
  void sendProblem(reply, problemDocument(code, [{ code, path: ['url'], message }], message, req));
}

function sendProblem(reply: FastifyReply, doc: Problem, headers: Readonly<Record<string, string>> = {}): FastifyReply {
  // A failure has no entity to validate: drop a tag set before the failure was found.
  reply.removeHeader('etag');
  reply.removeHeader('cache-control');
  return reply.code(doc.status).headers(headers).type(PROBLEM_MEDIA_TYPE).send(JSON.stringify(doc));
}

/** A route pattern (`/v1/hulls/:id`) as a matcher of request paths. */
function patternMatcher(url: string): RegExp {
  const body = url
    .split('/')
    .map((seg) => (seg.startsWith(':') ? '[^/]+' : seg.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')))
    .join('/');
  return new RegExp(`^${body}/?$`);
}

/**
 * The error handler, the 404 handler (405 with `Allow` when the path exists under other
 * methods). Register before the routes: it watches them being added.
 */
export function registerProblemHandler(app: FastifyInstance): void {
  const routes: { match: RegExp; methods: Set<string> }[] = [];
  app.addHook('onRoute', (opts) => {
    const methods = Array.isArray(opts.method) ? opts.method : [opts.method];
    let entry = routes.find((r) => r.match.source === patternMatcher(opts.url).source);
    if (entry === undefined) {
      entry = { match: patternMatcher(opts.url), methods: new Set() };
      routes.push(entry);
    }
    for (const m of methods) entry.methods.add(m.toUpperCase());
  });

  app.setErrorHandler((err: unknown, req, reply) => {
    if (err instanceof HalfbreadthError || err instanceof ServiceError) {
      const headers = err instanceof ServiceError ? err.headers : {};
      return sendProblem(reply, problemDocument(err.code, err.issues, err.message, req), headers);
    }
    const fe = err as FastifyError;
    const { code, message } = fromFastify(fe);
    if (STATUS_OF_CODE[code] >= 500) req.log.error({ err }, 'request failed');
    return sendProblem(reply, problemDocument(code, [{ code, path: [], message }], message, req));
  });

  app.setNotFoundHandler((req, reply) => {
    const path = req.url.split('?')[0] ?? req.url;
    const entry = routes.find((r) => r.match.test(path));
    if (entry !== undefined && !entry.methods.has(req.method)) {
      const allow = [...entry.methods].sort().join(', ');
      const message = `${req.method} is not answered at ${path}; it answers ${allow}`;
      return sendProblem(reply, problemDocument('HYD_METHOD_NOT_ALLOWED', [{ code: 'HYD_METHOD_NOT_ALLOWED', path: ['method'], message }], message, req), {
        allow,
      });
    }
    const message = `no route answers ${req.method} ${path.slice(0, 200)}; GET /docs lists the routes`;
    return sendProblem(reply, problemDocument('HYD_ROUTE_NOT_FOUND', [{ code: 'HYD_ROUTE_NOT_FOUND', path: ['url'], message }], message, req));
  });
}
