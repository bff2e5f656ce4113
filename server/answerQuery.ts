/**
 * The query fields every computation's answer takes, declared once: `format`, `units`,
 * `fields`, `digits`, `header`, and with an offsets file in the body `inputUnits`. A
 * computation does not declare them: requestSchemas (computations/computation.ts) adds
 * them to its own query, the routes read them with `outputOf`, and the shared output
 * step (core/report/answerForm.ts) applies them to the form the computation declares.
 * The rules are core's (core/report/outputOptions.ts); these schemas carry them to
 * validation and the OpenAPI document.
 */
import { z } from 'zod';
import { UNIT_SYSTEMS, LENGTH_UNITS, type LengthUnit, type UnitSystem } from '../core/common/units.js';
import { DEFAULT_DIGITS, DIGITS_RANGE, readDigits, readFields, type OutputOptions } from '../core/report/outputOptions.js';
import { FormatQuery, type Format } from './requestFields.js';
import { coreRule } from './validate.js';

/** `units=imperial`: the answer's unit system, and that of the lengths typed in the request. */
export const UnitsQuery = z
  .enum(UNIT_SYSTEMS, { error: `units must be one of ${UNIT_SYSTEMS.join(', ')}` })
  .optional()
  .describe(
    'si (default) or imperial: the answer in feet, square and cubic feet, ft4, long tons, TPI (long tons per inch; tpc becomes tpi) and MTI ' +
      '(long ton-feet per inch; mct1cm becomes mti); drafts and heights in the query or body are then feet, decimal or feet-inches-eighths (2-6-0, 3-4-5+, 3-4-5-)',
  );

/** `fields=displacement,wettedSurface`: the table's columns, in this order. */
export const FieldsQuery = z
  .string({ error: 'fields must be given once' })
  .transform((text, ctx) => coreRule(ctx, text, () => readFields(text, 'fields')))
  .optional()
  .describe('the columns of the table, comma-separated, in the order wanted (names as in the JSON rows, e.g. displacement,wettedSurface); all by default')
  .meta({ examples: ['displacement,wettedSurface'] });

/** `digits=6`: significant digits of every number. */
export const DigitsQuery = z
  .string({ error: 'digits must be given once' })
  .transform((text, ctx) => coreRule(ctx, text, () => readDigits(text, 'digits')))
  .optional()
  .describe(`significant digits of every number of the answer, ${DIGITS_RANGE.min} to ${DIGITS_RANGE.max} (default ${DEFAULT_DIGITS}; ${DIGITS_RANGE.max} gives the full double)`);

/** `header=plain`: a CSV whose first line is the column header, the caution on its last line. */
export const HeaderQuery = z
  .enum(['plain', 'comments'], { error: 'header must be plain or comments' })
  .optional()
  .describe(
    'plain: a CSV whose first line is the column header, the rows next and the # lines after them, the caution last (for a spreadsheet web query that takes ' +
      'the first row as the header); comments (default): the caution and the # lines first',
  );

/** `inputUnits=mm`: the unit of an offsets file in the body that says none. */
export const InputUnitsQuery = z
  .enum(LENGTH_UNITS, { error: `inputUnits must be one of ${LENGTH_UNITS.join(', ')}` })
  .optional()
  .describe("the unit of an offsets file in the body that has no '# units:' line and no unit in its x header cell (x (mm)); a file that gives one must agree");

/** The fields of every answer's query. */
export const ANSWER_QUERY = { format: FormatQuery, units: UnitsQuery, fields: FieldsQuery, digits: DigitsQuery, header: HeaderQuery } as const;

/** What a query of ANSWER_QUERY says. */
export interface AnswerQuery {
  readonly format?: Format | undefined;
  readonly units?: UnitSystem | undefined;
  readonly fields?: string[] | undefined;
  readonly digits?: number | undefined;
  readonly header?: 'plain' | 'comments' | undefined;
  readonly inputUnits?: LengthUnit | undefined;
}

/** The output options of a parsed query. */
export function outputOf(q: AnswerQuery): OutputOptions {
  return { units: q.units ?? 'si', fields: q.fields, digits: q.digits ?? DEFAULT_DIGITS, plainHeader: q.header === 'plain' };
}

/** The output options as one canonical text, for ETags. */
export function outputKey(o: OutputOptions): string {
  return `units=${o.units}&fields=${o.fields?.join(',') ?? ''}&digits=${o.digits}&header=${o.plainHeader ? 'plain' : ''}`;
}

/** The unit system a raw query asks for, to choose the form of its length fields before it is parsed (an invalid one is reported by the parse). */
export function unitsOfQuery(query: unknown): UnitSystem {
  const u = (query as Record<string, unknown> | undefined)?.['units'];
  return u === 'imperial' ? 'imperial' : 'si';
}
