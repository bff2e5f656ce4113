/**
 * The hydrostatic particulars at a trimmed waterline: the designer's table "at 0.3 m by
 * the stern", every field of the upright table at each draft with the trim held.
 *
 * The waterline is level across and rises aft: its height at x is d + (xm - x) · trim / LBP,
 * so trim = draft at AP - draft at FP (positive by the stern, the shared convention) and d,
 * the row's `draft`, is the draft amidships, half-way between the perpendiculars' drafts.
 * Each section is cut at its own height of that line and the ordinates integrated along
 * the length with the weights of the upright table (core/upright/waterlinePlan.ts), where
 * the immersed length now ends where the keel line meets the sloping waterline.
 *
 * The waterplane's area and moments are those of its projection on the horizontal, the
 * usual practice for trims of a few per cent of the length (common practice, no source):
 * the inclined plane's own area is larger by 1 / cos(trim angle), 1.00005 at 1 % of LBP.
 * The form coefficients take the draft amidships.
 */
import { fail, HalfbreadthError, type Issue } from '../common/errors.js';
import { SEA_WATER_DENSITY } from '../common/constants.js';
import type { PreparedHull } from '../hull/preparedHull.js';
import { rowOfPlan } from '../upright/hydrostatics.js';
import type { HydrostaticRow } from '../upright/hydrostaticFields.js';
import { waterlinePlan } from '../upright/waterlinePlan.js';

/** An upright table row at a trimmed waterline, with its drafts at the perpendiculars. */
export interface TrimmedRow extends HydrostaticRow {
  /** Draft at the aft perpendicular, m. */
  readonly draftAft: number;
  /** Draft at the forward perpendicular, m. */
  readonly draftFwd: number;
  /** draftAft - draftFwd, m; positive by the stern. */
  readonly trim: number;
}

const fmt = (v: number): string => String(Number(v.toPrecision(6)));

/**
 * Check that the waterline at `draft` amidships with `trim` lies on the hull: below every
 * station's deck edge and over some immersed station or keel line. The path names the draft.
 */
export function checkTrimmedDraft(p: PreparedHull, draft: number, trim: number, path: readonly (string | number)[] = ['draft']): void {
  if (!Number.isFinite(draft)) fail('HYD_DRAFT_LIST', path, `draft ${draft} is not a finite number`);
  const { xm, lbp } = p.perp;
  const tan = trim / lbp;
  let immersed = false;
  for (let i = 0; i < p.x.length; i++) {
    const level = draft + (xm - p.x[i]!) * tan;
    const deck = p.sections[i]!.zDeck;
    if (level > deck + 1e-12 * (1 + Math.abs(deck))) {
      fail(
        'HYD_DRAFT_OUT_OF_RANGE',
        path,
        `draft ${draft} m amidships with trim ${trim} m puts the waterline at z = ${fmt(level)} m at station x = ${p.x[i]} m, above its deck edge (z = ${fmt(deck)} m)`,
      );
    }
    if (level > p.keel[i]!) immersed = true;
  }
  if (!immersed) {
    fail('HYD_DRAFT_OUT_OF_RANGE', path, `draft ${draft} m amidships with trim ${trim} m leaves every station clear of the water`);
  }
}

/** The particulars at `draft` amidships (m) and `trim` (m, by the stern positive), density in t/m³. */
export function trimmedHydrostaticsAt(p: PreparedHull, draft: number, trim: number, density = SEA_WATER_DENSITY): TrimmedRow {
  checkTrimmedDraft(p, draft, trim);
  return trimmedRow(p, draft, trim, density);
}

function trimmedRow(p: PreparedHull, draft: number, trim: number, density: number): TrimmedRow {
  const { ap, fp, xm, lbp } = p.perp;
  const tan = trim / lbp;
  const row = rowOfPlan(p, waterlinePlan(p, draft, {}, tan), density);
  return { ...row, draftAft: draft + (xm - ap) * tan, draftFwd: draft + (xm - fp) * tan, trim };
}

/**
 * The table at a list of drafts amidships, all at one trim. Every draft is checked first,
 * each with its index named, so that nothing is half-computed.
 */
export function trimmedHydrostaticTable(p: PreparedHull, drafts: readonly number[], trim: number, density = SEA_WATER_DENSITY): TrimmedRow[] {
  if (!Number.isFinite(trim)) fail('HYD_ANGLE_RANGE', ['trim'], `trim ${trim} is not a finite number of metres`);
  const issues: Issue[] = [];
  drafts.forEach((d, k) => {
    try {
      checkTrimmedDraft(p, d, trim, ['drafts', k]);
    } catch (e) {
      if (e instanceof HalfbreadthError) issues.push(...e.issues);
      else throw e;
    }
  });
  if (issues.length > 0) throw new HalfbreadthError(issues);
  return drafts.map((d) => trimmedRow(p, d, trim, density));
}
