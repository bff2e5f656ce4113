/**
 * A computation the service offers on a hull. Each one is answered twice:
 * `POST /v1/<name>` on offsets in the body, and `GET /v1/hulls/{id}/<name>` on a stored
 * hull, in JSON or (where it has one) CSV. Adding a computation is one file here that
 * exports a `Computation` and one line in computations/index.ts; the routes, the
 * validation and the OpenAPI document follow from it.
 */
import { z } from 'zod';
import type { HalfbreadthError } from '../../core/common/errors.js';
import type { UnitSystem } from '../../core/common/units.js';
import { HullModelSchema, type HullModel } from '../../core/hull/hullModel.js';
import type { AnswerForm } from '../../core/report/answerForm.js';
import type { Converter } from '../../core/report/unitConversion.js';
import { ANSWER_QUERY, InputUnitsQuery } from '../answerQuery.js';
import type { Cost } from './cost.js';
import type { LoadedHull } from '../hullInput.js';
import { inUnitSystem, type Format } from '../requestFields.js';

export interface Computation<P, R> {
  /** URL segment. */
  readonly name: string;
  readonly summary: string;
  readonly description: string;
  /** Parameters as query text (stored hulls, CSV bodies); lengths declared with the SI fields of requestFields.ts. */
  readonly query: z.ZodObject;
  /** The same parameters as fields of a JSON body, beside `offsets`. */
  readonly body: z.ZodObject;
  /** Schema of the JSON result (SI, every column). */
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
  /** The result, in SI; `conv` writes the lengths in its words (notes, the sheet's lines) in the answer's unit. */
  run(hull: LoadedHull, params: P, conv: Converter): R;
  /**
   * The answer's form (core/report/answerForm.ts): the unit of each number, the table's
   * columns, where its rows are and what it is of. The shared query fields (format,
   * units, fields, digits, header, inputUnits) work on it with no code here.
   */
  form(params: P): AnswerForm<R>;
  /** True when the answer is JSON only (findings rather than a table). */
  readonly jsonOnly?: boolean;
  /** The answer for offsets that break a rule, when that is an answer rather than a failure. */
  readonly invalid?: (err: HalfbreadthError) => R;
  /** True when `run` asks for how the offsets file is written (hull.reading()), which a stored hull reads from its upload. */
  readonly usesNotes?: boolean;
}

/** Any computation, for the list of them (parameters and results differ from one to the next). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type AnyComputation = Computation<any, any>;

export function formatsOf(c: AnyComputation): Format[] {
  return c.jsonOnly === true ? ['json'] : ['json', 'csv'];
}

const OffsetsRequired = z.custom<unknown>((v) => v !== undefined, { error: 'offsets is required: the hull model, lengths in m' });

/**
 * The request schemas of a computation, for validation and for the OpenAPI document:
 * its own parameters (lengths in the unit system asked for) with the shared answer
 * fields (answerQuery.ts).
 */
export function requestSchemas(c: AnyComputation, units: UnitSystem = 'si'): RequestSchemas {
  // Made once per computation and unit system: a zod object built per request costs more than the answer it validates.
  const kept = madeSchemas.get(c)?.[units];
  if (kept !== undefined) return kept;
  const made = makeSchemas(c, units);
  madeSchemas.set(c, { ...madeSchemas.get(c), [units]: made });
  return made;
}

type RequestSchemas = ReturnType<typeof makeSchemas>;
const madeSchemas = new WeakMap<AnyComputation, Partial<Record<UnitSystem, RequestSchemas>>>();

function makeSchemas(c: AnyComputation, units: UnitSystem) {
  const query = inUnitSystem(c.query, units).extend(ANSWER_QUERY).strict();
  return {
    /** Query of a stored hull's GET. */
    query,
    /** Query of a POST with a CSV body: also the unit of a file that gives none. */
    csvQuery: query.extend({ inputUnits: InputUnitsQuery }).strict(),
    /** Query of a POST with a JSON body: the parameters go in the body. */
    jsonQuery: z.object(ANSWER_QUERY).strict(),
    jsonBody: inUnitSystem(c.body, units).extend({ offsets: OffsetsRequired }).strict(),
    jsonBodyDocument: c.body.extend({ offsets: HullModelSchema }).strict(),
  };
}
