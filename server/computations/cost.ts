/**
 * What a computation costs, known before it starts, from the size of the hull and the
 * parameters. Every computation declares its `cost` (computation.ts); the service then
 * refuses an answer over SERVICE_LIMITS.maxAnswerCells (422) before computing anything,
 * and runs on the request thread only work up to SERVICE_LIMITS.inlineWork, sending the
 * rest to the worker threads. Input sizes are bounded earlier, by core's LIMITS while
 * reading.
 *
 * Work is counted in units of about 70 ns: one section evaluated at one draft (measured
 * with `npm run bench`: a 200-draft table of a 101-station hull, 20,200 units, takes about
 * 1.4 ms). Preparing a hull costs about 5 units a point.
 */
import type { HullModel } from '../../core/hull/hullModel.js';
import { serviceFail } from '../serviceErrors.js';
import { SERVICE_LIMITS } from '../serviceLimits.js';

export interface Cost {
  /** Numbers in the answer. */
  readonly cells: number;
  /** Work units (see the module note). */
  readonly work: number;
}

/** Work units of preparing one point of a hull (fitting its section). */
export const PREPARE_WORK_PER_POINT = 5;

/** Points of every station together. */
export function pointsOf(hull: HullModel): number {
  let n = 0;
  for (const st of hull.stations) n += st.points.length;
  return n;
}

/** Work of preparing the hull. */
export const prepareWork = (hull: HullModel): number => PREPARE_WORK_PER_POINT * pointsOf(hull);

/** Refuse an answer larger than the limit, naming the computation, its size and the limit (422). */
export function checkAnswerSize(name: string, cost: Cost, maxCells: number = SERVICE_LIMITS.maxAnswerCells): void {
  if (cost.cells > maxCells) {
    serviceFail(
      'HYD_ANSWER_TOO_LARGE',
      [name],
      `the ${name} answer would hold about ${Math.round(cost.cells)} numbers; the limit is ${maxCells} (maxAnswerCells): ask for fewer drafts or heights, a single draft lower down, or fewer stations`,
    );
  }
}
