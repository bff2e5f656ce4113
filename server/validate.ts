/**
 * Request validation with zod: one schema gives the check, the TypeScript type
 * (z.infer) and the OpenAPI document. Failures become a HalfbreadthError carrying
 * every issue, each with the path of the field and a code from core's catalogue.
 */
import { z } from 'zod';
import { ERROR_CODES, HalfbreadthError, issue, type ErrorCode, type Issue } from '../core/common/errors.js';
import { pathText } from '../core/offsets/readHullJson.js';

const isCode = (v: unknown): v is ErrorCode => typeof v === 'string' && Object.hasOwn(ERROR_CODES, v);

/** The code of an issue on a request field: a custom issue names its own, else the field's (FIELD_CODES), else HYD_BAD_ARGUMENT. */
export type FieldCodes = Readonly<Partial<Record<string, ErrorCode>>>;

function issuesOf(error: z.ZodError, codes: FieldCodes): Issue[] {
  const out: Issue[] = [];
  for (const zi of error.issues) {
    const path = zi.path.map((p) => (typeof p === 'symbol' ? String(p) : p));
    if (zi.code === 'unrecognized_keys') {
      for (const key of zi.keys) {
        const at = [...path, key];
        out.push(issue('HYD_BAD_ARGUMENT', at, `${pathText(at)}: not a field this route takes`));
      }
      continue;
    }
    const params = (zi as { params?: { code?: unknown } }).params;
    const head = path[0];
    if (isCode(params?.code)) {
      // A rule of core: its message names the place already.
      out.push(issue(params.code, path, zi.message));
      continue;
    }
    const code = (typeof head === 'string' ? codes[head] : undefined) ?? 'HYD_BAD_ARGUMENT';
    out.push(issue(code, path, path.length === 0 ? zi.message : `${pathText(path)}: ${zi.message}`));
  }
  return out;
}

/** A JSON body must be an object of named fields. */
export function requireObject(value: unknown, shape: string): Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    const got = value === null ? 'null' : Array.isArray(value) ? 'an array' : `a ${typeof value}`;
    throw new HalfbreadthError([issue('HYD_BAD_ARGUMENT', ['body'], `the JSON body must be an object ${shape}, not ${got}`)]);
  }
  return value as Record<string, unknown>;
}

/** The value parsed by `schema`, or a HalfbreadthError with every issue. */
export function parseOrFail<S extends z.ZodType>(schema: S, value: unknown, codes: FieldCodes = {}): z.output<S> {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  throw new HalfbreadthError(issuesOf(r.error, codes));
}

/** Pass a core failure's issues to zod from inside a transform, keeping their codes and the field's path. */
export function addCoreIssues(e: unknown, ctx: z.RefinementCtx, input: unknown): void {
  if (!(e instanceof HalfbreadthError)) throw e;
  for (const i of e.issues) {
    ctx.addIssue({ code: 'custom', message: i.message, path: i.path.slice(1), input, params: { code: i.code } });
  }
}

/** A core rule run inside a zod transform: its value, or its issues passed on with their codes (addCoreIssues). */
export function coreRule<T>(ctx: z.RefinementCtx, input: unknown, f: () => T): T {
  try {
    return f();
  } catch (e) {
    addCoreIssues(e, ctx, input);
    return z.NEVER;
  }
}
