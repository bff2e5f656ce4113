/** Writes the OpenAPI document to openapi/openapi.json (`npm run openapi`). */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { openapiText } from './openapi.js';
import { ALL_ROUTES } from './routes/index.js';

/** openapi/ at the package root, from the sources (server/) or the build (dist/server/). */
const target = fileURLToPath(new URL(import.meta.url.includes('/dist/server/') ? '../../openapi/openapi.json' : '../openapi/openapi.json', import.meta.url));
writeFileSync(target, openapiText(ALL_ROUTES));
process.stdout.write(`wrote ${target}\n`);
