/**
 * Gathering the issues of several independent inputs (the file, the drafts, the
 * density) so that one run reports all of them, not the first.
 */
import { HalfbreadthError, type Issue } from '../core/common/errors.js';

/** Run `f`; if it throws HalfbreadthError, keep its issues and give undefined. Other faults pass through. */
export function attempt<T>(f: () => T, into: Issue[]): T | undefined {
  try {
    return f();
  } catch (e) {
    if (e instanceof HalfbreadthError) {
      into.push(...e.issues);
      return undefined;
    }
    throw e;
  }
}

/** The async form of attempt. */
export async function attemptAsync<T>(f: () => Promise<T>, into: Issue[]): Promise<T | undefined> {
  try {
    return await f();
  } catch (e) {
    if (e instanceof HalfbreadthError) {
      into.push(...e.issues);
      return undefined;
    }
    throw e;
  }
}

/** Throw the gathered issues, if any. */
export function throwIfAny(issues: readonly Issue[]): void {
  if (issues.length > 0) throw new HalfbreadthError(issues);
}
