/**
 * Reading a hull model given as JSON (already parsed): the schema of core/hull/hullModel.ts,
 * geometric rules included, with every issue thrown at once. Each issue keeps the zod
 * path into the model (`["stations", 2, "points", 0, "y"]`); a broken geometric rule
 * keeps its own code, a list longer than its limit (core/common/limits.ts) is HYD_TOO_LARGE,
 * other mismatches are HYD_MODEL_INVALID.
 */
import { ERROR_CODES, HalfbreadthError, issue, type ErrorCode, type Issue } from '../common/errors.js';
import { HullModelSchema, type HullModel } from '../hull/hullModel.js';

const isCode = (v: unknown): v is ErrorCode => typeof v === 'string' && Object.hasOwn(ERROR_CODES, v);

/** `stations[2].points[0].y`, or `the hull` for the root. */
export function pathText(path: readonly (string | number)[]): string {
  let s = '';
  for (const p of path) s += typeof p === 'number' ? `[${p}]` : s === '' ? p : `.${p}`;
  return s === '' ? 'the hull' : s;
}

/** Validate a parsed JSON value as a hull model in metres; throws HalfbreadthError with every issue. */
export function readHullJson(value: unknown): HullModel {
  const r = HullModelSchema.safeParse(value);
  if (r.success) return r.data;
  const issues: Issue[] = r.error.issues.map((z) => {
    const path = z.path.map((p) => (typeof p === 'symbol' ? String(p) : p));
    const params = (z as { params?: { code?: unknown } }).params;
    const tooMany = z.code === 'too_big' && z.origin === 'array';
    const code = isCode(params?.code) ? params.code : tooMany ? 'HYD_TOO_LARGE' : 'HYD_MODEL_INVALID';
    return issue(code, path, `${pathText(path)}: ${z.message}`);
  });
  throw new HalfbreadthError(issues);
}
