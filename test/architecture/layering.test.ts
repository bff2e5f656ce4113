/**
 * The layers of core/, kept true as the code grows: a file of core/ imports only from its
 * own folder or from a folder lower in LAYERS, never from server/ or cli/, and never a
 * module that does I/O. The order is written here once; DEVELOPERS.md explains it.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';

/** core/'s folders, lowest layer first. `stability` is reserved for the stability work. */
const LAYERS = ['common', 'quadrature', 'hull', 'offsets', 'fairness', 'upright', 'stability', 'report', 'plots', 'document'] as const;

/** Packages core/ may use: all pure computation or parsing (no file, network or process access). */
const ALLOWED_PACKAGES = new Set(['zod', 'papaparse', 'mathjs', 'd3-array', 'd3-scale', 'd3-shape']);

const CORE = fileURLToPath(new URL('../../core/', import.meta.url));

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? sourceFiles(p) : name.endsWith('.ts') ? [p] : [];
  });
}

/** Every module specifier of a source text: static imports, re-exports and dynamic imports. */
function specifiers(text: string): string[] {
  const found: string[] = [];
  const patterns = [/\b(?:import|export)\b[^;'"]*?\bfrom\s*['"]([^'"]+)['"]/g, /\bimport\s*['"]([^'"]+)['"]/g, /\bimport\(\s*['"]([^'"]+)['"]\s*\)/g];
  for (const re of patterns) for (const m of text.matchAll(re)) found.push(m[1]!);
  return found;
}

/** The layer of a path under core/: its first folder, or 'root' for core/index.ts. */
function layerOf(path: string): string {
  const parts = relative(CORE, path).split(/[\\/]/);
  return parts.length === 1 ? 'root' : parts[0]!;
}

/** Why `file` may not import `spec`, or undefined when it may. */
function breach(file: string, spec: string): string | undefined {
  if (!spec.startsWith('.')) {
    if (spec.startsWith('node:') || !ALLOWED_PACKAGES.has(spec)) return `imports '${spec}', which core/ may not use (no I/O in core)`;
    return undefined;
  }
  const target = resolve(dirname(file), spec);
  if (relative(CORE, target).startsWith('..')) return `imports '${spec}', outside core/`;
  const from = layerOf(file);
  const to = layerOf(target);
  if (from === 'root') return undefined;
  const rank = (l: string): number => (LAYERS as readonly string[]).indexOf(l);
  if (rank(from) < 0) return `lies in core/${from}/, a folder not in the list of layers`;
  if (to === 'root') return `imports core/index.ts; import the module itself`;
  if (rank(to) < 0) return `imports from core/${to}/, a folder not in the list of layers`;
  if (rank(to) > rank(from)) return `imports from core/${to}/, a layer above its own (core/${from}/)`;
  return undefined;
}

describe('the layers of core/', () => {
  const files = sourceFiles(CORE);

  test('every folder of core/ is a named layer', () => {
    const folders = readdirSync(CORE).filter((n) => statSync(join(CORE, n)).isDirectory());
    expect(folders.filter((f) => !(LAYERS as readonly string[]).includes(f))).toEqual([]);
  });

  test('no file of core/ imports from a layer above its own, from outside core/, or a module with I/O', () => {
    const breaches: string[] = [];
    for (const file of files) {
      for (const spec of specifiers(readFileSync(file, 'utf8'))) {
        const why = breach(file, spec);
        if (why !== undefined) breaches.push(`${relative(CORE, file)} ${why}`);
      }
    }
    expect(breaches).toEqual([]);
  });

  test('the check itself catches an upward import, a way out of core/ and an I/O module', () => {
    const lower = join(CORE, 'hull', 'section.ts');
    expect(breach(lower, '../upright/hydrostatics.js')).toMatch(/layer above its own/);
    expect(breach(lower, '../../server/app.js')).toMatch(/outside core/);
    expect(breach(lower, 'node:fs')).toMatch(/no I\/O/);
    expect(breach(lower, '../quadrature/simpson.js')).toBeUndefined();
    expect(breach(join(CORE, 'report', 'textTable.ts'), '../common/caution.js')).toBeUndefined();
  });

  test('the import reader finds static, re-export, type-only and dynamic imports', () => {
    const text = "import { a } from './a.js';\nimport type { B } from '../b/b.js';\nexport * from './c.js';\nconst m = await import('mathjs');\nimport './side.js';";
    expect(specifiers(text).sort()).toEqual(['../b/b.js', './a.js', './c.js', './side.js', 'mathjs'].sort());
  });
});
