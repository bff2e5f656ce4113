/**
 * One figure of the hydrostatic table as plain text, for a spreadsheet cell that fetches
 * a URL (`=WEBSERVICE(...)` and the like): `GET /v1/hulls/{id}/hydrostatics/{field}?draft=1.2`
 * answers `13.79`, text/plain, nothing else in the body. A cell has no room for the
 * caution, so it goes in the `Halfbreadth-Caution` response header and in this route's
 * documentation. The figure is the hydrostatics computation's, through the same shared
 * output step (units, digits) and the same ETag and answer cache as the table.
 */
import { z } from 'zod';
import { CAUTION } from '../../core/common/caution.js';
import { HYDROSTATICS_FORM } from '../../core/report/formatHydrostatics.js';
import { selectColumns } from '../../core/report/answerForm.js';
import { converterFor } from '../../core/report/unitConversion.js';
import { DigitsQuery, outputKey, outputOf, UnitsQuery, unitsOfQuery } from '../answerQuery.js';
import { hydrostatics } from '../computations/hydrostatics.js';
import { DensityQuery, DraftQuery, FIELD_CODES, inUnitSystem } from '../requestFields.js';
import { parseOrFail } from '../validate.js';
import { sendAnswer } from './answer.js';
import { storedAnswer } from './compute.js';
import type { RouteSpec } from './routeSpec.js';
import { HullIdParams, requireHullMeta } from './storedHull.js';
import { HYDROSTATIC_FIELDS } from '../../core/upright/hydrostaticFields.js';

/** The response header that carries the caution of a single value. */
export const CAUTION_HEADER = 'Halfbreadth-Caution';

const ValueQuery = z.object({ draft: DraftQuery, density: DensityQuery, units: UnitsQuery, digits: DigitsQuery }).strict();

const ValueParams = HullIdParams.extend({
  field: z
    .string()
    .describe(`a field of the hydrostatic table: ${HYDROSTATIC_FIELDS.map((f) => f.key).join(', ')} (with units=imperial also tpi and mti for tpc and mct1cm)`),
});

export const VALUE_ROUTES: readonly RouteSpec[] = [
  {
    method: 'GET',
    url: '/v1/hulls/:id/hydrostatics/:field',
    operationId: 'hydrostaticValueOfStoredHull',
    tag: 'compute',
    summary: 'One figure of the hydrostatic table of a stored hull, as plain text',
    description:
      'One number of the upright hydrostatic table at one draft, as text/plain for a spreadsheet cell that fetches a URL: the body is the ' +
      'number alone (empty where a coefficient cannot be formed), in SI or with units=imperial, to digits= significant digits (default 12). ' +
      `The caution travels in the ${CAUTION_HEADER} response header, since a cell has no room for it: ${CAUTION}`,
    params: ValueParams,
    query: ValueQuery,
    responses: {
      200: {
        description: 'the figure as text',
        other: { mediaType: 'text/plain', description: 'the number alone, e.g. 13.79; empty where a coefficient cannot be formed' },
        headers: ['ETag', { name: CAUTION_HEADER, description: `the caution that goes with every result: ${CAUTION}` }],
      },
      304: { description: 'the copy named in If-None-Match is current' },
    },
    problems: [400, 404, 422, 503],
    handler: async (req, reply, ctx) => {
      const meta = requireHullMeta(ctx.store, req);
      const q = parseOrFail(inUnitSystem(ValueQuery, unitsOfQuery(req.query)), req.query, FIELD_CODES) as z.output<typeof ValueQuery>;
      const field = (req.params as { field?: string }).field ?? '';
      const output = outputOf({ units: q.units, digits: q.digits, fields: [field] });
      selectColumns(HYDROSTATICS_FORM, output, await converterFor(output.units));
      const params = { drafts: [q.draft], density: q.density };
      reply.header(CAUTION_HEADER, CAUTION);
      const answer = await storedAnswer(ctx, req, reply, hydrostatics, meta, params, { format: 'value', output }, [hydrostatics.key(params), 'value', outputKey(output)]);
      return answer === undefined ? reply : sendAnswer(reply, answer);
    },
  },
];
