/**
 * A computed value as the command line and the service write it: rounded to 12
 * significant digits (the documented default of `--digits` and `digits=`; README,
 * "Command line"), which JavaScript then writes in its shortest form. Written here
 * from that rule with toPrecision, not through the project's own rounding, so a test
 * that compares an answer with core's figures through it checks the rule too.
 */
export function written(value: number, digits = 12): number {
  return Number.isFinite(value) && value !== 0 ? Number(value.toPrecision(digits)) : value;
}

/** Every number of a plain value (objects, arrays) as written; NaN and the infinities become null, as in JSON. */
export function writtenAll<T>(value: T, digits = 12): T {
  if (typeof value === 'number') return (Number.isFinite(value) ? written(value, digits) : null) as T;
  if (Array.isArray(value)) return value.map((v: unknown) => writtenAll(v, digits)) as T;
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value as Record<string, unknown>).map(([k, v]) => [k, writtenAll(v, digits)])) as T;
  }
  return value;
}
