/**
 * Durability of the hull store: a child process writing hulls is killed with SIGKILL
 * mid-stream, twenty times over one data directory. After each kill every hull whose
 * write it acknowledged (printed after the commit returned) is there and whole, every
 * replace and delete it acknowledged holds, and no hull exists that is not one of the
 * writes it made.
 *
 * "Whole" is checked from outside the store's code: SQLite's own integrity check, the
 * sha256 of the stored bytes (node:crypto) against the stored hash, the stored model
 * against core's reading of the stored bytes, and the model against the hull schema.
 * The claim rests on SQLite's atomic commit (sqlite.org, "Atomic Commit In SQLite" and
 * "Write-Ahead Logging"), which the store relies on with WAL and synchronous=FULL.
 */
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { isDeepStrictEqual } from 'node:util';
import Database from 'better-sqlite3';
import { afterAll, expect, test } from 'vitest';
import { readHullJson } from '../../core/offsets/readHullJson.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { STORE_FILE } from '../../server/store/hullStore.js';

// Twenty kills in CI; three in a local run, which still kills mid-write every time.
const ROUNDS = process.env.CI ? 20 : 3;
const dir = mkdtempSync(join(tmpdir(), 'halfbreadth-durability-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// The writer as built into dist/ (test/globalSetup.ts keeps it current): plain node starts it fast.
const writer = fileURLToPath(new URL('../../dist/test/fixtures/durabilityWriter.js', import.meta.url));

interface Op {
  op: 'create' | 'put' | 'del';
  id: string;
  hash: string;
}

/** Run the writer until it has acknowledged a few writes and a random moment more has passed, then SIGKILL it. */
function runAndKill(): Promise<{ acked: Op[]; pending: Op | undefined }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [writer, dir], { stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    let err = '';
    let killTimer: NodeJS.Timeout | undefined;
    child.stdout.setEncoding('utf8');
    child.stderr.setEncoding('utf8');
    child.stdout.on('data', (chunk: string) => {
      out += chunk;
      if (killTimer === undefined && out.includes('ack ')) {
        killTimer = setTimeout(() => child.kill('SIGKILL'), 20 + Math.random() * 250);
      }
    });
    child.stderr.on('data', (chunk: string) => (err += chunk));
    const deadline = setTimeout(() => child.kill('SIGKILL'), 15_000);
    child.on('error', reject);
    child.on('exit', (_code, signal) => {
      clearTimeout(deadline);
      if (signal !== 'SIGKILL') return reject(new Error(`the writer stopped by itself: ${err}`));
      // Only whole lines count; SIGKILL cannot cut a short pipe write, but be strict.
      const lines = out.slice(0, out.lastIndexOf('\n') + 1).split('\n').filter((l) => l !== '');
      const acked: Op[] = [];
      let pending: Op | undefined;
      for (const line of lines) {
        const [kind, op, id, hash] = line.split(' ') as [string, Op['op'], string, string];
        if (kind === 'try') pending = { op, id, hash };
        else if (kind === 'ack') {
          expect(pending).toEqual({ op, id, hash });
          acked.push({ op, id, hash });
          pending = undefined;
        }
      }
      resolve({ acked, pending });
    });
  });
}

/** What each id must hold: a hash, or absent (null), from acknowledged writes. */
const expected = new Map<string, string | null>();

/**
 * Rows already read back whole: id -> its source hash and its model's bytes. A row whose
 * hash and model bytes are unchanged since is only hashed again. The model is read as
 * its bytes (CAST AS BLOB) and compared byte for byte, not decoded into a string each
 * round: the store grows to tens of MB over twenty rounds.
 */
const readBack = new Map<string, { hash: string; model: Buffer }>();

function verify(pending: Op | undefined): number {
  const db = new Database(join(dir, STORE_FILE), { readonly: true });
  try {
    expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
    const rows = db.prepare('SELECT id, name, source, source_hash, CAST(model AS BLOB) AS model, stations, media_type FROM hulls').all() as {
      id: string;
      name: string;
      source: Buffer;
      source_hash: string;
      model: Buffer;
      stations: number;
      media_type: string;
    }[];
    const stored = new Map(rows.map((r) => [r.id, r]));
    for (const r of rows) {
      // Every stored hull is one of the writes made (acknowledged, or the one in flight).
      expect(expected.has(r.id) || pending?.id === r.id, `hull ${r.id} was never written`).toBe(true);
      expect(createHash('sha256').update(r.source).digest('hex')).toBe(r.source_hash);
      const before = readBack.get(r.id);
      if (before !== undefined && before.hash === r.source_hash && before.model.equals(r.model)) continue;
      const model = readHullJson(JSON.parse(r.model.toString('utf8')));
      const read = readOffsetsCsv(r.source.toString('utf8')).hull;
      // node:util's deep strict equality first (fast on models of 5,000 stations): it holds
      // only where toEqual holds, so toEqual is asked, and shows the difference, otherwise.
      if (!isDeepStrictEqual(read, model)) expect(read).toEqual(model);
      expect(r.stations).toBe(model.stations.length);
      expect(r.name).toBe(model.name);
      expect(r.media_type).toBe('text/csv');
      readBack.set(r.id, { hash: r.source_hash, model: r.model });
    }
    for (const [id, hash] of expected) {
      const row = stored.get(id);
      const inFlight = pending?.id === id ? (pending.op === 'del' ? null : pending.hash) : undefined;
      const got = row === undefined ? null : row.source_hash;
      if (inFlight !== undefined && got === inFlight) continue;
      expect(got, `hull ${id} after an acknowledged write`).toBe(hash);
    }
    return rows.length;
  } finally {
    db.close();
  }
}

test(`every acknowledged hull survives SIGKILL, ${ROUNDS} times over`, async () => {
  let acknowledged = 0;
  for (let round = 0; round < ROUNDS; round++) {
    const { acked, pending } = await runAndKill();
    expect(acked.length).toBeGreaterThan(0);
    acknowledged += acked.length;
    for (const a of acked) expected.set(a.id, a.op === 'del' ? null : a.hash);
    verify(pending);
    // The write in flight either happened or did not; from here on its outcome is what is stored.
    if (pending !== undefined) {
      const db = new Database(join(dir, STORE_FILE), { readonly: true });
      const row = db.prepare('SELECT source_hash FROM hulls WHERE id = ?').get(pending.id) as { source_hash: string } | undefined;
      db.close();
      expected.set(pending.id, row?.source_hash ?? null);
    }
  }
  expect(acknowledged).toBeGreaterThan(ROUNDS);
}, 90_000);
