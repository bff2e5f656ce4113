/** The service's own routes: health, the OpenAPI document, the API page and the problem-type pages. */
import { z } from 'zod';
import { CAUTION } from '../../core/common/caution.js';
import { docsHtml, problemHtml } from '../docsPage.js';
import { JSON_MEDIA_TYPE } from '../negotiate.js';
import { codeOfSlug } from '../problem.js';
import { HealthSchema } from '../responseSchemas.js';
import { serviceFail } from '../serviceErrors.js';
import type { RouteSpec } from './routeSpec.js';

const HTML = 'text/html; charset=utf-8';
/** The pages load nothing from anywhere and run no script. */
const PAGE_POLICY = "default-src 'none'; style-src 'unsafe-inline'";

const HEALTH_BODY = JSON.stringify({ status: 'ok', caution: CAUTION });

let docsCache: { doc: unknown; html: string } | undefined;

export const SERVICE_ROUTES: readonly RouteSpec[] = [
  {
    method: 'GET',
    url: '/healthz',
    operationId: 'health',
    tag: 'service',
    summary: 'Health',
    description: 'Answers 200 while the service takes requests.',
    responses: { 200: { description: 'the service is up', json: HealthSchema } },
    problems: [],
    handler: (_req, reply) => reply.type(JSON_MEDIA_TYPE).send(HEALTH_BODY),
  },
  {
    method: 'GET',
    url: '/openapi.json',
    operationId: 'openapiDocument',
    tag: 'service',
    summary: 'This API as an OpenAPI 3.1 document',
    description: 'The same document as openapi/openapi.json in the repository.',
    responses: { 200: { description: 'the OpenAPI document', other: { mediaType: 'application/json', description: 'OpenAPI 3.1' } } },
    problems: [],
    handler: (_req, reply, ctx) => reply.type(JSON_MEDIA_TYPE).send(JSON.stringify(ctx.openapi())),
  },
  {
    method: 'GET',
    url: '/docs',
    operationId: 'apiPage',
    tag: 'service',
    summary: 'The API page',
    description: 'A plain page listing the routes, their parameters and answers, and the problem types.',
    responses: { 200: { description: 'the page', other: { mediaType: 'text/html', description: 'HTML' } } },
    problems: [],
    handler: (_req, reply, ctx) => {
      const doc = ctx.openapi();
      if (docsCache?.doc !== doc) docsCache = { doc, html: docsHtml(doc) };
      return reply.type(HTML).header('content-security-policy', PAGE_POLICY).send(docsCache.html);
    },
  },
  {
    method: 'GET',
    url: '/problems/:slug',
    operationId: 'problemType',
    tag: 'service',
    summary: 'What a problem type means',
    description: 'The page a problem document\'s type URI names.',
    params: z.object({ slug: z.string().describe('the slug of a problem type, e.g. draft-out-of-range') }),
    query: z.object({}).strict(),
    responses: { 200: { description: 'the page', other: { mediaType: 'text/html', description: 'HTML' } } },
    problems: [404],
    handler: (req, reply) => {
      const slug = (req.params as { slug: string }).slug;
      const code = codeOfSlug(slug);
      if (code === undefined) serviceFail('HYD_ROUTE_NOT_FOUND', ['slug'], `there is no problem type "${slug.slice(0, 80)}"; GET /docs lists them`);
      return reply.type(HTML).header('content-security-policy', PAGE_POLICY).send(problemHtml(code));
    },
  },
];
