/**
 * Failures that belong to HTTP rather than to a hull: an unknown id or route, a body
 * that is not JSON or not UTF-8, the wrong media type. They sit beside core's catalogue
 * (core/common/errors.ts), which holds the rules an offsets file or a query value can break;
 * server/problem.ts maps both to statuses in one table.
 */
import type { ErrorCode } from '../core/common/errors.js';
import { SERVICE_LIMITS } from './serviceLimits.js';

export const SERVICE_CODES = {
  HYD_BODY_UNREADABLE: 'The request body cannot be read: not valid JSON, not UTF-8, empty or cut short.',
  HYD_BODY_TOO_LARGE: `The request body is larger than ${SERVICE_LIMITS.bodyLimit / (1024 * 1024)} MiB.`,
  HYD_MEDIA_TYPE: 'The body is of a media type the route does not take.',
  HYD_NOT_ACCEPTABLE: 'None of the media types the client accepts can be given.',
  HYD_HULL_NOT_FOUND: 'No hull is stored under that id.',
  HYD_ROUTE_NOT_FOUND: 'No route answers that path.',
  HYD_METHOD_NOT_ALLOWED: 'The route does not answer that method.',
  HYD_ANSWER_TOO_LARGE: `The answer would hold more than ${SERVICE_LIMITS.maxAnswerCells} numbers; ask for fewer drafts, heights or a smaller hull.`,
  HYD_PRECONDITION_FAILED: 'The hull has changed since the version named in If-Match.',
  HYD_BAD_REQUEST: 'The request is not well-formed HTTP.',
  HYD_REQUEST_TIMEOUT: 'The request did not arrive in full within the time allowed.',
  HYD_HEADERS_TOO_LARGE: `The request line and headers are longer than ${SERVICE_LIMITS.maxHeaderSize} bytes.`,
  HYD_BUSY: 'Every worker thread is busy and the queue is full; retry after the time Retry-After gives.',
  HYD_COMPUTE_LIMIT: 'The computation ran past its time or memory limit and was stopped.',
  HYD_INTERNAL: 'The service failed unexpectedly; the request may be retried.',
} as const;

export type ServiceCode = keyof typeof SERVICE_CODES;

/** A code of either catalogue: what a problem document's issues carry. */
export type ProblemCode = ErrorCode | ServiceCode;

export interface ProblemIssue {
  readonly code: ProblemCode;
  readonly path: readonly (string | number)[];
  readonly message: string;
}

/** A failure of the request at the HTTP level; `headers` go on the response (`Allow` for 405). */
export class ServiceError extends Error {
  readonly code: ServiceCode;
  readonly issues: readonly ProblemIssue[];
  readonly headers: Readonly<Record<string, string>>;

  constructor(code: ServiceCode, path: readonly (string | number)[], message: string, headers: Record<string, string> = {}, issues?: readonly ProblemIssue[]) {
    super(message);
    this.name = 'ServiceError';
    this.code = code;
    this.issues = issues ?? [{ code, path, message }];
    this.headers = headers;
  }
}

export function serviceFail(code: ServiceCode, path: readonly (string | number)[], message: string, headers?: Record<string, string>): never {
  throw new ServiceError(code, path, message, headers);
}
