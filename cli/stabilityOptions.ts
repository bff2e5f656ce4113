/**
 * The options of the stability commands (float, cross-curves, gz), read in one place:
 * a displacement (t, or long tons with --units imperial), lengths of the centre of
 * gravity and of openings (m, or feet), a free-surface moment (t·m, or long ton-feet),
 * heels (degrees), the trim mode, a criteria file, and which deck edges the offsets file
 * leaves unsaid. The rules themselves are core's (core/stability/stabilityInput.ts,
 * core/stability/criteria.ts); each message names the option.
 */
import { readDecimal } from '../core/common/decimal.js';
import { fail, HalfbreadthError, issue, type Issue } from '../core/common/errors.js';
import { readTypedLength, TYPED_LENGTH_HINT, TYPED_MASS_UNIT, typedMassFactor, typedMomentFactor } from '../core/common/typedLength.js';
import type { UnitSystem } from '../core/common/units.js';
import { deckAssumedAt } from '../core/offsets/readingWarnings.js';
import type { ReadResult } from '../core/offsets/readOffsets.js';
import { readCriteriaSet, type CriteriaSet } from '../core/stability/criteria.js';
import type { TrimMode } from '../core/stability/crossCurves.js';
import type { Opening } from '../core/stability/rightingLevers.js';
import { checkHeels, parseDisplacements, parseHeels, parseOpenings, type DeckEdges } from '../core/stability/stabilityInput.js';
import { attempt, attemptAsync } from './collect.js';
import type { CommandArgs, OptionSpec } from './command.js';
import { str, type CliIo } from './io.js';

/** Largest criteria file read, bytes: a set is a few lines. */
const MAX_CRITERIA_BYTES = 64 * 1024;

/** A length option (--kg, --lcg, --tcg, --trim), in metres or (imperial) feet; given in metres, undefined when not given. */
export function lengthOption(values: CommandArgs['values'], name: string, system: UnitSystem): number | undefined {
  const text = str(values[name]);
  if (text === undefined) return undefined;
  const v = readTypedLength(text.trim(), system);
  if (!Number.isFinite(v)) fail('HYD_BAD_ARGUMENT', [`--${name}`], `--${name} '${text.slice(0, 40)}' is not ${TYPED_LENGTH_HINT[system]}`);
  return v;
}

/** --displacement, in tonnes or (imperial) long tons; given in tonnes. Whether the hull floats it is core's check. */
export function displacementOption(values: CommandArgs['values'], system: UnitSystem): number {
  const text = str(values['displacement']) ?? '';
  const v = readDecimal(text.trim());
  if (!Number.isFinite(v)) fail('HYD_BAD_ARGUMENT', ['--displacement'], `--displacement '${text.slice(0, 40)}' is not one number of ${TYPED_MASS_UNIT[system]}`);
  return v * typedMassFactor(system);
}

/** --fsm, the free-surface moment, t·m or (imperial) long ton-feet, at least 0; given in t·m. */
export function fsmOption(values: CommandArgs['values'], system: UnitSystem): number {
  const text = str(values['fsm']);
  if (text === undefined) return 0;
  const v = readDecimal(text.trim());
  const unit = system === 'si' ? 't.m' : 'LT.ft';
  if (!Number.isFinite(v) || v < 0) fail('HYD_BAD_ARGUMENT', ['--fsm'], `--fsm '${text.slice(0, 40)}' is not a free-surface moment of 0 or more, ${unit}`);
  return v * typedMomentFactor(system);
}

/** --free-trim or --level-trim; `otherwise` when neither. */
export function trimModeOption(values: CommandArgs['values'], otherwise: TrimMode): TrimMode {
  if (values['free-trim'] === true && values['level-trim'] === true) fail('HYD_BAD_ARGUMENT', ['--free-trim'], '--free-trim and --level-trim both set the trim; give one of them');
  if (values['free-trim'] === true) return 'free';
  if (values['level-trim'] === true) return 'level';
  return otherwise;
}

/** A criteria set from the JSON file --criteria names (core/stability/criteria.ts), or undefined for the default set. */
export async function criteriaOption(values: CommandArgs['values'], io: CliIo): Promise<CriteriaSet | undefined> {
  const path = str(values['criteria']);
  if (path === undefined) return undefined;
  let bytes: Uint8Array;
  try {
    bytes = await io.readFile(path);
  } catch (e) {
    if (e instanceof HalfbreadthError) throw e;
    const why = (e as NodeJS.ErrnoException).code === 'ENOENT' ? 'there is no such file' : 'it cannot be read';
    throw new HalfbreadthError([issue('HYD_CRITERIA', ['--criteria'], `--criteria ${path.slice(0, 200)}: ${why}`)]);
  }
  if (bytes.length > MAX_CRITERIA_BYTES) fail('HYD_CRITERIA', ['--criteria'], `--criteria ${path.slice(0, 200)} is larger than ${MAX_CRITERIA_BYTES / 1024} KiB; a criteria set is a few lines of JSON`);
  let json: unknown;
  try {
    json = JSON.parse(new TextDecoder().decode(bytes));
  } catch (e) {
    fail('HYD_CRITERIA', ['--criteria'], `--criteria ${path.slice(0, 200)} is not JSON: ${(e as Error).message}`);
  }
  // The set's own faults, said as the option and the file that gave them.
  try {
    return readCriteriaSet(json, ['criteria']);
  } catch (e) {
    if (!(e instanceof HalfbreadthError)) throw e;
    throw new HalfbreadthError(e.issues.map((i) => ({ ...i, path: ['--criteria', ...i.path.slice(1)], message: `--criteria ${path.slice(0, 200)}: ${i.message}` })));
  }
}

/** The deck edges a read offsets file leaves unsaid (heeled work refuses them). */
export function deckEdgesOf(read: Pick<ReadResult, 'notes'>): DeckEdges {
  return { assumedAt: deckAssumedAt(read.notes) };
}

/** The specifications of the stability options of a plot or the report. */
export const STABILITY_OPTIONS: Readonly<Record<string, OptionSpec>> = {
  displacements: { type: 'string', example: '--displacements 2:0.5:6' },
  heels: { type: 'string', example: '--heels 0:10:90' },
  'free-trim': { type: 'boolean' },
  'level-trim': { type: 'boolean' },
  displacement: { type: 'string', example: '--displacement 4.5' },
  kg: { type: 'string', example: '--kg 1.1' },
  fsm: { type: 'string', example: '--fsm 0.4' },
  opening: { type: 'string', repeatable: true, example: '--opening 5.2,0.8,1.4' },
  criteria: { type: 'string', example: '--criteria small-craft.json' },
};

/** The stability options a plot or the report takes, each read when given. */
export interface StabilityChoice {
  displacements?: number[];
  heels?: number[];
  trim?: TrimMode;
  displacement?: number;
  kg?: number;
  fsm?: number;
  openings?: Opening[];
  criteria?: CriteriaSet;
}

/** Read every stability option given (SI), adding each problem to `issues`. */
export async function stabilityChoice(values: CommandArgs['values'], io: CliIo, issues: Issue[]): Promise<StabilityChoice> {
  const out: StabilityChoice = {};
  const text = (k: string): string => str(values[k]) ?? '';
  const given = (k: string): boolean => values[k] !== undefined;
  const put = <K extends keyof StabilityChoice>(k: K, v: StabilityChoice[K] | undefined): void => {
    if (v !== undefined) out[k] = v;
  };
  if (given('displacements')) put('displacements', attempt(() => parseDisplacements(text('displacements'), ['--displacements']), issues));
  if (given('heels')) {
    put('heels', attempt(() => {
      const list = parseHeels(text('heels'), ['--heels']);
      checkHeels(list, ['--heels']);
      return list;
    }, issues));
  }
  if (given('free-trim') || given('level-trim')) put('trim', attempt(() => trimModeOption(values, 'level'), issues));
  if (given('displacement')) put('displacement', attempt(() => displacementOption(values, 'si'), issues));
  put('kg', attempt(() => lengthOption(values, 'kg', 'si'), issues));
  if (given('fsm')) put('fsm', attempt(() => fsmOption(values, 'si'), issues));
  if (given('opening')) put('openings', attempt(() => parseOpenings(text('opening'), ['--opening']), issues));
  put('criteria', await attemptAsync(() => criteriaOption(values, io), issues));
  return out;
}
