/**
 * The work of a request that may be heavy, as plain data in and plain data out, so that
 * it runs the same on the request thread or in a worker thread (worker.ts): reading a
 * hull from a body or from the store's model text, checking the answer's size, computing
 * and writing the answer's text. No Fastify here.
 *
 * Failures cross a thread as data (`WireError`) and become the same HalfbreadthError or
 * ServiceError on the other side (`fromWire`), so the problem document does not depend
 * on where the work ran.
 */
import { HalfbreadthError } from '../../core/common/errors.js';
import type { HullModel } from '../../core/hull/hullModel.js';
import { writeOffsetsCsv } from '../../core/offsets/writeOffsets.js';
import type { LengthUnit } from '../../core/common/units.js';
import { hullSummary, type HullSummary } from '../../core/report/formatHydrostatics.js';
import type { KeptAnswer } from '../answerCache.js';
import { COMPUTATIONS } from '../computations/index.js';
import { requestSchemas, type AnyComputation } from '../computations/computation.js';
import { checkAnswerSize } from '../computations/cost.js';
import { hullFromCsv, hullFromJson, loadHull, renamed, sourceReading, type LoadedHull, type ReadHull } from '../hullInput.js';
import { jsonText } from '../jsonText.js';
import { CSV_MEDIA_TYPE, JSON_MEDIA_TYPE, TEXT_MEDIA_TYPE } from '../negotiate.js';
import { parseJsonText } from '../plugins/uploadBody.js';
import { FIELD_CODES, NameField, type Format } from '../requestFields.js';
import { ServiceError, type ProblemIssue, type ServiceCode } from '../serviceErrors.js';
import type { HullForm } from '../store/hullStore.js';
import { parseOrFail, requireObject } from '../validate.js';
import { z } from 'zod';
import { fail } from '../../core/common/errors.js';
import type { LengthUnit as FileUnit } from '../../core/common/units.js';
import { answerCsv, answerJson, answerValue, shapeAnswer } from '../../core/report/answerForm.js';
import type { OutputOptions } from '../../core/report/outputOptions.js';
import { converterFor, type Converter } from '../../core/report/unitConversion.js';

/** Where a hull comes from: an offsets file, a JSON body (parameters beside `offsets`), or a stored model's JSON text. */
export type HullSource =
  | { readonly kind: 'csv'; readonly text: string }
  | { readonly kind: 'json'; readonly text: string }
  | {
      readonly kind: 'stored';
      readonly modelText: string;
      readonly form: HullForm;
      readonly units: string;
      /** The upload's text, for a computation that reads the notes on how it is written (Computation.usesNotes). */
      readonly sourceText?: string | undefined;
    };

/** The forms of an answer: JSON, CSV, or one value as text (the single-value route). */
export type AnswerFormat = Format | 'value';

/** A computation on a hull: its answer's text. `params` are the validated query's, for csv and stored sources. */
export interface ComputeJob {
  readonly kind: 'compute';
  readonly computation: string;
  readonly source: HullSource;
  readonly params?: unknown;
  readonly format: AnswerFormat;
  readonly filename: string;
  /** Units, fields, digits and header of the answer (core/report/outputOptions.ts). */
  readonly output: OutputOptions;
  /** The unit of an offsets file in the body that gives none. */
  readonly inputUnits?: FileUnit | undefined;
}

/** Reading an upload for the store: the model as JSON text and what the record says of it. */
export interface ReadJob {
  readonly kind: 'read';
  readonly source: Extract<HullSource, { kind: 'csv' | 'json' }>;
  /** A name given in the query. */
  readonly name?: string | undefined;
  /** The unit of an offsets file that gives none. */
  readonly inputUnits?: FileUnit | undefined;
}

/** Writing a stored model back as an offsets file. */
export interface ExportJob {
  readonly kind: 'export';
  readonly modelText: string;
  readonly units: LengthUnit;
}

export type Job = ComputeJob | ReadJob | ExportJob;

export interface ReadOutcome {
  readonly modelText: string;
  readonly summary: HullSummary;
  readonly form: HullForm;
  readonly units: string;
}

export type JobValue = KeptAnswer | ReadOutcome | string;

/** A failure as data. */
export interface WireError {
  readonly kind: 'halfbreadth' | 'service';
  readonly code: string;
  readonly message: string;
  readonly issues: readonly ProblemIssue[];
  readonly headers: Readonly<Record<string, string>>;
}

export type JobOutcome = { readonly ok: true; readonly value: JobValue } | { readonly ok: false; readonly error: WireError };

export function toWire(e: unknown): WireError {
  if (e instanceof HalfbreadthError) return { kind: 'halfbreadth', code: e.code, message: e.message, issues: e.issues, headers: {} };
  if (e instanceof ServiceError) return { kind: 'service', code: e.code, message: e.message, issues: e.issues, headers: e.headers };
  throw e;
}

export function fromWire(w: WireError): Error {
  if (w.kind === 'halfbreadth') return new HalfbreadthError(w.issues as HalfbreadthError['issues'], w.message);
  return new ServiceError(w.code as ServiceCode, [], w.message, { ...w.headers }, w.issues);
}

export function computationNamed(name: string): AnyComputation {
  const c = COMPUTATIONS.find((k) => k.name === name);
  if (c === undefined) throw new Error(`no computation ${name}`);
  return c;
}

/** The hull of a source, and for a JSON body the parameters beside it (validated with the computation's schema, lengths in the job's units). */
export function readSource(c: AnyComputation, job: Pick<ComputeJob, 'source' | 'params' | 'output' | 'inputUnits'>): { read: ReadHull; params: unknown } {
  const { source, params } = job;
  if (source.kind === 'csv') return { read: hullFromCsv(source.text, job.inputUnits), params };
  if (source.kind === 'stored') {
    const text = source.sourceText;
    const reading = sourceReading('text/csv', () => (text === undefined ? undefined : Buffer.from(text, 'utf8')), source.units);
    return { read: { hull: JSON.parse(source.modelText) as HullModel, form: source.form, units: source.units, ...reading }, params };
  }
  const shape = `{"offsets": <hull model>${Object.keys(c.body.shape).map((k) => `, "${k}"`).join('')}}`;
  const body = parseOrFail(requestSchemas(c, job.output.units).jsonBody, requireObject(parseJsonText(source.text), shape), FIELD_CODES) as { offsets: unknown };
  return { read: hullFromJson(body.offsets), params: body };
}

/** The answer's text in the chosen form, through the shared output step (core/report/answerForm.ts). */
export function renderResult(c: AnyComputation, result: unknown, params: unknown, job: Pick<ComputeJob, 'format' | 'filename' | 'output'>, conv: Converter): KeptAnswer {
  const a = shapeAnswer(c.form(params), result, job.output, conv);
  if (job.format === 'value') return { mediaType: TEXT_MEDIA_TYPE, body: answerValue(a) };
  if (job.format === 'csv' && c.jsonOnly !== true) return { mediaType: CSV_MEDIA_TYPE, body: answerCsv(a), filename: `${job.filename}.csv` };
  return { mediaType: JSON_MEDIA_TYPE, body: jsonText(answerJson(a)) };
}

/** Check the answer's size, compute and write it, on a hull already loaded. */
export function computeAnswer(c: AnyComputation, hull: LoadedHull, params: unknown, job: Pick<ComputeJob, 'format' | 'filename' | 'output'>, conv: Converter): KeptAnswer {
  checkAnswerSize(c.name, c.cost(hull.hull, params));
  return renderResult(c, c.run(hull, params, conv), params, job, conv);
}

async function runCompute(job: ComputeJob): Promise<KeptAnswer> {
  const c = computationNamed(job.computation);
  const conv = await converterFor(job.output.units);
  let input: { read: ReadHull; params: unknown };
  try {
    input = readSource(c, job);
  } catch (e) {
    // Offsets that break a rule are the answer of a computation that says so (the check).
    if (e instanceof HalfbreadthError && c.invalid !== undefined && job.source.kind !== 'stored') return renderResult(c, c.invalid(e), job.params, job, conv);
    throw e;
  }
  return computeAnswer(c, loadHull(input.read), input.params, job, conv);
}

const UploadJsonBody = z
  .object({
    offsets: z.custom<unknown>((v) => v !== undefined, { error: 'offsets is required: the hull model, lengths in m' }),
    name: NameField,
  })
  .strict();

/** The hull of an upload for the store, with a name given beside it (in the query, or in a JSON body) in place of its own. */
export function readUpload(source: ReadJob['source'], queryName: string | undefined, inputUnits?: FileUnit): ReadHull {
  if (source.kind === 'csv') return renamed(hullFromCsv(source.text, inputUnits), queryName);
  const body = parseOrFail(UploadJsonBody, requireObject(parseJsonText(source.text), '{"offsets": <hull model>, "name"?}'), FIELD_CODES);
  if (body.name !== undefined && queryName !== undefined) fail('HYD_BAD_ARGUMENT', ['name'], 'name: given both in the query and in the body; give it once');
  return renamed(hullFromJson(body.offsets), queryName ?? body.name);
}

export { UploadJsonBody };

function runRead(job: ReadJob): ReadOutcome {
  const r = readUpload(job.source, job.name, job.inputUnits);
  return { modelText: JSON.stringify(r.hull), summary: hullSummary(r.hull), form: r.form, units: r.units };
}

/** Run a job; failures of the input come back as data. */
export async function runJob(job: Job): Promise<JobOutcome> {
  try {
    if (job.kind === 'compute') return { ok: true, value: await runCompute(job) };
    if (job.kind === 'read') return { ok: true, value: runRead(job) };
    return { ok: true, value: writeOffsetsCsv(JSON.parse(job.modelText) as HullModel, { units: job.units }) };
  } catch (e) {
    return { ok: false, error: toWire(e) };
  }
}
