/**
 * Runs once before the tests: makes sure dist/ holds a build of the current sources,
 * because the end-to-end tests run what users run (bin/halfbreadth.js over
 * dist/cli/main.js, node dist/server/main.js). `npm test` has just built it
 * (tsc -b, with the type-check), so this usually only compares times; when the tests
 * are run alone after an edit (`npx vitest run ...`) it builds first, and a type error
 * fails the run.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, readdirSync, statSync, utimesSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const STAMP = join(ROOT, 'dist', '.tsbuildinfo');
const SOURCES = ['core', 'cli', 'server', 'bench', 'test'];

function newestSource(dir: string): number {
  let newest = 0;
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    const s = statSync(p);
    if (s.isDirectory()) newest = Math.max(newest, newestSource(p));
    else if (/\.(ts|mts|cts|mjs)$/.test(name)) newest = Math.max(newest, s.mtimeMs);
  }
  return newest;
}

export default function setup(): void {
  const built = existsSync(STAMP) ? statSync(STAMP).mtimeMs : 0;
  const newest = Math.max(...SOURCES.map((d) => newestSource(join(ROOT, d))), statSync(join(ROOT, 'tsconfig.json')).mtimeMs);
  if (newest <= built) return;
  // The build is the type-check (tsc -b: a few tenths of a second when nothing changed);
  // a type error fails the run here, as it fails npm test's own build step.
  execFileSync(process.execPath, [join(ROOT, 'node_modules', 'typescript', 'bin', 'tsc'), '-b', join(ROOT, 'tsconfig.json')], { cwd: ROOT, stdio: 'inherit' });
  // tsc leaves the stamp alone when no source changed in content; mark this build as current.
  if (existsSync(STAMP)) utimesSync(STAMP, new Date(), new Date());
}
