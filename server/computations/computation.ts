/**
 * A computation the service offers on a hull. Each one is answered twice:
 * `POST /v1/<name>` on offsets in the body, and `GET /v1/hulls/{id}/<name>` on a stored
 * hull, in JSON or (where it has one) CSV. Adding a computation is one file here that
 * exports a `Computation` and one line in computations/index.ts; the routes, the
 * validation and the OpenAPI document follow from it.
 */
import { z } from 'zod';
import type { HalfbreadthError } from '../../core/common/errors.js';
import { HullModelSchema, type HullModel } from '../../core/hull/hullModel.js';
import type { Cost } from './cost.js';
import type { LoadedHull } from '../hullInput.js';
import { FormatQuery, type Format } from '../requestFields.js';

export interface Computation<P, R> {
  /** URL segment. */
  readonly name: string;
  readonly summary: string;
  readonly description: string;
  /** Parameters as query text (stored hulls, CSV bodies). */
  readonly query: z.ZodObject;
  /** The same parameters as fields of a JSON body, beside `offsets`. */
  readonly body: z.ZodObject;
  /** Schema of the JSON result. */
  readonly result: z.ZodType;
  /** The parameters in one canonical text, for the ETag. */
  key(params: P): string;
  /**
   * What the answer costs, from the hull and the parameters, before anything is
   * computed (cost.ts): `cells`, the numbers in the answer, bounded by
   * SERVICE_LIMITS.maxAnswerCells (422 beyond); `work`, which decides whether it runs
   * on the request thread or in a worker thread. Cheap: at most one pass over the stations.
   */
  cost(hull: HullModel, params: P): Cost;
  run(hull: LoadedHull, params: P): R;
  /** The CSV form of the result, when there is one. */
  readonly csv?: (result: R) => string;
  /** The answer for offsets that break a rule, when that is an answer rather than a failure. */
  readonly invalid?: (err: HalfbreadthError) => R;
  /** True when `run` asks for the notes on how the offsets file is written (hull.notes()), which a stored hull reads from its upload. */
  readonly usesNotes?: boolean;
}

/** Any computation, for the list of them (parameters and results differ from one to the next). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type AnyComputation = Computation<any, any>;

export function formatsOf(c: AnyComputation): Format[] {
  return c.csv === undefined ? ['json'] : ['json', 'csv'];
}

const OffsetsRequired = z.custom<unknown>((v) => v !== undefined, { error: 'offsets is required: the hull model, lengths in m' });

/** The request schemas of a computation: for validation, and for the OpenAPI document (the same but for `offsets`). */
export function requestSchemas(c: AnyComputation) {
  return {
    /** Query of a stored hull's GET and of a POST with a CSV body. */
    query: c.query.extend({ format: FormatQuery }).strict(),
    /** Query of a POST with a JSON body: the parameters go in the body. */
    jsonQuery: z.object({ format: FormatQuery }).strict(),
    jsonBody: c.body.extend({ offsets: OffsetsRequired }).strict(),
    jsonBodyDocument: c.body.extend({ offsets: HullModelSchema }).strict(),
  };
}
