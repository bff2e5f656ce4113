/**
 * Loading the demo hulls (offsets-demo/*.csv) into the store at start. Idempotent by
 * content: a file whose bytes are stored already (same sha256) is skipped, so restarts
 * never duplicate. Each demo hull gets a readable id, `demo-<file name>`, so links to it
 * stay the same from one installation to the next; a hull already under that id (one a
 * user replaced) is left as it is. A file that does not read is reported and skipped.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { HalfbreadthError } from '../core/common/errors.js';
import { hullFromCsv } from './hullInput.js';
import { sha256, type HullStore } from './store/hullStore.js';

export interface PreloadOutcome {
  readonly file: string;
  readonly id: string;
  readonly outcome: 'stored' | 'present' | 'id-taken' | 'unreadable';
  readonly detail?: string;
}

export function demoId(file: string): string {
  return `demo-${basename(file, '.csv').replace(/[^A-Za-z0-9_-]+/g, '-')}`;
}

export function preloadDemo(store: HullStore, dir: string): PreloadOutcome[] {
  const files = readdirSync(dir).filter((f) => f.endsWith('.csv')).sort();
  return files.map((file): PreloadOutcome => {
    const id = demoId(file);
    const bytes = readFileSync(join(dir, file));
    if (store.findByHash(sha256(bytes)).length > 0) return { file, id, outcome: 'present' };
    if (store.meta(id) !== undefined) return { file, id, outcome: 'id-taken', detail: 'a hull with other offsets is stored under this id; it is kept' };
    try {
      const read = hullFromCsv(bytes.toString('utf8'));
      store.create({ model: read.hull, form: read.form, units: read.units, mediaType: 'text/csv', source: bytes }, id);
      return { file, id, outcome: 'stored' };
    } catch (e) {
      if (!(e instanceof HalfbreadthError)) throw e;
      return { file, id, outcome: 'unreadable', detail: e.message };
    }
  });
}
