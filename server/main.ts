/**
 * The service as a process: listens on HOST:PORT (default 127.0.0.1:3000), keeps hulls
 * under HALFBREADTH_DATA (default ./data), loads the demo hulls, logs one JSON line per
 * request (pino), and on SIGTERM or SIGINT stops taking requests, lets those in flight
 * finish, closes the store and exits.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { readDecimal } from '../core/common/decimal.js';
import { buildApp } from './app.js';
import { preloadDemo } from './preloadDemo.js';
import { SERVICE_LIMITS } from './serviceLimits.js';
import { bindWarning } from './bindWarning.js';
import { startBanner } from './startBanner.js';

function port(text: string | undefined): number {
  if (text === undefined || text === '') return 3000;
  const n = readDecimal(text);
  if (!Number.isInteger(n) || n < 0 || n > 65535) {
    process.stderr.write(`PORT must be an integer from 0 to 65535, not ${JSON.stringify(text)}\n`);
    process.exit(2);
  }
  return n;
}

/** offsets-demo/ beside the package, from the sources (server/) or the build (dist/server/). */
function demoDir(): string | undefined {
  if (process.env.HALFBREADTH_DEMO !== undefined) return process.env.HALFBREADTH_DEMO === '' ? undefined : process.env.HALFBREADTH_DEMO;
  for (const rel of ['../offsets-demo/', '../../offsets-demo/']) {
    const dir = fileURLToPath(new URL(rel, import.meta.url));
    if (existsSync(dir)) return dir;
  }
  return undefined;
}

const dataDir = process.env.HALFBREADTH_DATA ?? './data';
const app = await buildApp({ dataDir, logger: { level: process.env.HALFBREADTH_LOG_LEVEL ?? 'info' } }).catch((e: unknown) => {
  // A store that cannot be opened (no permission, a newer schema) is a reason not to start, said plainly.
  process.stderr.write(`cannot open the hull store in ${dataDir}: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exit(1);
});

const demo = demoDir();
const demoIds: string[] = [];
if (demo !== undefined) {
  for (const o of preloadDemo(app.halfbreadth.store, demo)) {
    if (o.outcome !== 'unreadable') demoIds.push(o.id);
    if (o.outcome === 'unreadable') app.log.warn({ demo: o }, 'demo hull not loaded');
    else app.log.info({ demo: o }, 'demo hull');
  }
}

let stopping = false;
async function stop(signal: string): Promise<void> {
  if (stopping) {
    app.log.warn({ signal }, 'second signal: exiting at once');
    process.exit(1);
  }
  stopping = true;
  app.log.info({ signal }, 'stopping: finishing requests in flight');
  const timer = setTimeout(() => {
    app.log.error('requests in flight did not finish in time; exiting');
    process.exit(1);
  }, SERVICE_LIMITS.shutdownGrace);
  timer.unref();
  await app.close();
  app.log.info('stopped');
  process.exit(0);
}
process.on('SIGTERM', () => void stop('SIGTERM'));
process.on('SIGINT', () => void stop('SIGINT'));

try {
  const host = process.env.HOST ?? '127.0.0.1';
  const address = await app.listen({ port: port(process.env.PORT), host });
  const warning = bindWarning(host);
  if (warning !== undefined) app.log.warn({ host }, warning);
  if (process.stderr.isTTY || process.env.HALFBREADTH_BANNER === '1') process.stderr.write(startBanner(app.halfbreadth.store, demoIds, address));
} catch (e) {
  app.log.error({ err: e }, 'cannot listen');
  process.exit(1);
}
