/**
 * The hull store (server/store), its migrations, the demo preload and the cache of
 * prepared hulls.
 *
 * Sources: the SHA-256 test vector of FIPS 180-2, appendix B.1 ("abc"); SQLite's
 * documentation of PRAGMA journal_mode, synchronous (2 = FULL) and user_version
 * (sqlite.org/pragma.html); the rest are properties the store promises (a write is
 * whole or absent, ids are url-safe, uploads come back byte for byte).
 */
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, expectTypeOf, test } from 'vitest';
import type { HullModel } from '../../core/hull/hullModel.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';
import { Lru } from '../../server/lru.js';
import { PreparedCache } from '../../server/preparedCache.js';
import { demoId, preloadDemo } from '../../server/preloadDemo.js';
import { HullStore, newHullId, sha256, STORE_FILE, type NewHull } from '../../server/store/hullStore.js';
import { MIGRATIONS, SCHEMA_VERSION, migrate, schemaVersion } from '../../server/store/migrations.js';
import { boxBarge } from '../fixtures/hulls.js';
import { boxCsv } from '../fixtures/serverHelpers.js';
import '../helpers/relClose.js';

const dirs: string[] = [];
const tempDir = (): string => {
  const d = mkdtempSync(join(tmpdir(), 'halfbreadth-store-'));
  dirs.push(d);
  return d;
};
afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));

const demoDir = new URL('../../offsets-demo/', import.meta.url).pathname;

function upload(text: string): NewHull {
  const r = readOffsetsCsv(text);
  return { model: r.hull, form: r.form, units: r.units, mediaType: 'text/csv', source: Buffer.from(text) };
}

describe('hashes and ids', () => {
  test('sha256 of "abc" is the FIPS 180-2 test vector', () => {
    expect(sha256('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  test('ids are 16 url-safe characters and do not repeat', () => {
    const ids = new Set(Array.from({ length: 2000 }, newHullId));
    expect(ids.size).toBe(2000);
    for (const id of ids) expect(id).toMatch(/^[A-Za-z0-9_-]{16}$/);
  });
});

describe('the store on disk', () => {
  test('runs in WAL mode with synchronous FULL, at the latest schema version', () => {
    const store = HullStore.open(tempDir());
    expect(store.settings()).toEqual({ journalMode: 'wal', synchronous: 2, schemaVersion: SCHEMA_VERSION });
    store.close();
  });

  test('keeps the upload byte for byte beside its hash and the model read from it', () => {
    const dir = tempDir();
    const text = `\uFEFF${boxCsv('kept box', 6, 2, 1).replace(/\n/g, '\r\n')}`;
    const h = upload(text);
    let store = HullStore.open(dir);
    const meta = store.create(h);
    store.close();
    store = HullStore.open(dir);
    const src = store.source(meta.id)!;
    expect(Buffer.compare(src.bytes, Buffer.from(text))).toBe(0);
    expect(src.mediaType).toBe('text/csv');
    const got = store.get(meta.id)!;
    expect(got.hash).toBe(sha256(Buffer.from(text)));
    expect(got.model).toEqual(readOffsetsCsv(text).hull);
    expect(got).toMatchObject({ name: 'kept box', stations: 11, form: 'grid', units: 'm', bytes: Buffer.byteLength(text) });
    store.close();
  });

  test('create, replace, delete, list and find by hash', () => {
    const store = HullStore.open(':memory:');
    const a = store.create(upload(boxCsv('a', 6, 2, 1)));
    const b = store.create(upload(boxCsv('b', 8, 2, 1)));
    // Oldest first; two made in the same millisecond in the order they were made.
    expect(store.list().map((m) => m.id)).toEqual([a.id, b.id]);
    const replaced = store.replace(a.id, upload(boxCsv('a2', 10, 2, 1)))!;
    expect(replaced).toMatchObject({ id: a.id, created: a.created, name: 'a2' });
    expect(replaced.hash).not.toBe(a.hash);
    expect(store.replace('missing', upload(boxCsv('x', 6, 2, 1)))).toBeUndefined();
    expect(store.findByHash(b.hash).map((m) => m.id)).toEqual([b.id]);
    expect(store.findByHash(a.hash)).toEqual([]);
    expect(store.delete(b.id)).toBe(true);
    expect(store.delete(b.id)).toBe(false);
    expect(store.get(b.id)).toBeUndefined();
    expect(store.count()).toBe(1);
    store.close();
  });

  test('a second hull under a taken id is refused and the first is untouched', () => {
    const store = HullStore.open(':memory:');
    const first = store.create(upload(boxCsv('first', 6, 2, 1)), 'fixed-id');
    expect(() => store.create(upload(boxCsv('second', 6, 2, 1)), 'fixed-id')).toThrow(/UNIQUE/);
    expect(store.get('fixed-id')).toMatchObject({ name: 'first', hash: first.hash });
    store.close();
  });

  test('a JSON model is stored as its own upload', () => {
    const store = HullStore.open(':memory:');
    const model: HullModel = boxBarge(6, 2, 1);
    const source = Buffer.from(JSON.stringify({ offsets: model }));
    const meta = store.create({ model, form: 'model', units: 'm', mediaType: 'application/json', source });
    expect(store.get(meta.id)!.model).toEqual(model);
    expect(store.source(meta.id)!.bytes.toString()).toBe(source.toString());
    store.close();
  });
});

describe('migrations', () => {
  test('a new file is brought to the latest version, in order, and opening again changes nothing', () => {
    const db = new Database(':memory:');
    expect(schemaVersion(db)).toBe(0);
    expect(migrate(db)).toEqual({ from: 0, to: SCHEMA_VERSION });
    expect(migrate(db)).toEqual({ from: SCHEMA_VERSION, to: SCHEMA_VERSION });
    expect(MIGRATIONS.map((m) => m.version)).toEqual(MIGRATIONS.map((_m, k) => k + 1));
    db.close();
  });

  test('a migration that fails leaves the schema at the version before it', () => {
    const db = new Database(':memory:');
    migrate(db);
    const broken = [...MIGRATIONS, { version: SCHEMA_VERSION + 1, description: 'fails half way', sql: 'CREATE TABLE half (a); SELECT * FROM no_such_table;' }];
    expect(() => migrate(db, broken)).toThrow(/no_such_table/);
    expect(schemaVersion(db)).toBe(SCHEMA_VERSION);
    expect(db.prepare("SELECT count(*) AS n FROM sqlite_master WHERE name = 'half'").get()).toEqual({ n: 0 });
    db.close();
  });

  test('a file written by a newer release is refused and left untouched', () => {
    const dir = tempDir();
    HullStore.open(dir).close();
    const file = join(dir, STORE_FILE);
    const db = new Database(file);
    db.pragma(`user_version = ${SCHEMA_VERSION + 5}`);
    db.close();
    const before = readFileSync(file);
    expect(() => HullStore.open(dir)).toThrow(`the hull store is at schema version ${SCHEMA_VERSION + 5}, written by a newer Halfbreadth`);
    expect(Buffer.compare(readFileSync(file), before)).toBe(0);
    expect(statSync(file).size).toBe(before.length);
  });
});

describe('the demo preload', () => {
  test('stores each demo file once under a readable id; again, and after a restart, it adds nothing', () => {
    const dir = tempDir();
    const files = ['survey-launch.csv', 'workboat-ftin.csv', 'workboat.csv'];
    let store = HullStore.open(dir);
    const first = preloadDemo(store, demoDir);
    expect(first.filter((o) => files.includes(o.file)).map((o) => [o.id, o.outcome])).toEqual(files.map((f) => [demoId(f), 'stored']));
    const count = store.count();
    expect(preloadDemo(store, demoDir).every((o) => o.outcome === 'present')).toBe(true);
    store.close();
    store = HullStore.open(dir);
    expect(preloadDemo(store, demoDir).every((o) => o.outcome === 'present')).toBe(true);
    expect(store.count()).toBe(count);
    expect(store.get('demo-workboat')!.model).toEqual(readOffsetsCsv(readFileSync(join(demoDir, 'workboat.csv'), 'utf8')).hull);
    store.close();
  });

  test('a hull a user put under a demo id is kept', () => {
    const store = HullStore.open(':memory:');
    store.create(upload(boxCsv('mine', 6, 2, 1)), 'demo-workboat');
    const outcome = preloadDemo(store, demoDir).find((o) => o.file === 'workboat.csv');
    expect(outcome?.outcome).toBe('id-taken');
    expect(store.get('demo-workboat')!.name).toBe('mine');
    store.close();
  });
});

describe('the caches', () => {
  test('the LRU drops the entry used longest ago', () => {
    const lru = new Lru<string, number>(2);
    lru.set('a', 1);
    lru.set('b', 2);
    expect(lru.get('a')).toBe(1);
    lru.set('c', 3);
    expect(lru.get('b')).toBeUndefined();
    expect(lru.get('a')).toBe(1);
    expect(lru.get('c')).toBe(3);
    expect(lru.size).toBe(2);
    expect(() => new Lru(0)).toThrow(RangeError);
  });

  test('a stored hull is prepared once; replaced, it is prepared anew', () => {
    const store = HullStore.open(':memory:');
    const cache = new PreparedCache(store, 4);
    const meta = store.create(upload(boxCsv('cached', 6, 2, 1)));
    const first = cache.get(store.meta(meta.id)!);
    expect(cache.get(store.meta(meta.id)!)).toBe(first);
    store.replace(meta.id, upload(boxCsv('cached', 12, 2, 1)));
    const second = cache.get(store.meta(meta.id)!);
    expect(second).not.toBe(first);
    expect(second.prepared.perp.lbp).toBe(12);
    expect(cache.size).toBe(2);
    cache.forget(meta.id);
    expect(cache.size).toBe(0);
    store.close();
  });

  test('the store types what it returns', () => {
    expectTypeOf<ReturnType<HullStore['get']>>().toEqualTypeOf<import('../../server/store/hullStore.js').StoredHull | undefined>();
  });
});

describe('the answer cache', () => {
  test('keeps answers asked for twice by tag, drops the least recently used past its size, and refuses one too big to keep', async () => {
    const { AnswerCache } = await import('../../server/answerCache.js');
    const cache = new AnswerCache(100);
    // An answer is kept the second time its tag is offered (the first time only the tag is remembered).
    const offer = (tag: string, body: string): void => {
      cache.set(tag, { mediaType: 'text/csv', body });
      cache.set(tag, { mediaType: 'text/csv', body });
    };
    cache.set('once', { mediaType: 'text/csv', body: 'o' });
    expect(cache.get('once')).toBeUndefined();
    offer('a', 'x'.repeat(20));
    offer('b', 'y'.repeat(20));
    expect(cache.get('a')?.body).toBe('x'.repeat(20));
    offer('c', 'z'.repeat(24));
    offer('d', 'w'.repeat(24));
    offer('e', 'v'.repeat(24));
    // 20 + 20 + 24 + 24 + 24 > 100: b, used longest ago, goes first.
    expect(cache.get('b')).toBeUndefined();
    expect(cache.get('a')).toBeDefined();
    offer('huge', 'h'.repeat(26));
    expect(cache.get('huge')).toBeUndefined();
  });

  test('a replaced hull is not answered from the cache', async () => {
    const { buildApp } = await import('../../server/app.js');
    const app = await buildApp();
    const created = JSON.parse((await app.inject({ method: 'POST', url: '/v1/hulls', headers: { 'content-type': 'text/csv' }, payload: boxCsv('cached', 10, 4, 2) })).body);
    const url = `/v1/hulls/${created.id}/hydrostatics?drafts=1`;
    const first = JSON.parse((await app.inject({ method: 'GET', url })).body);
    expect(JSON.parse((await app.inject({ method: 'GET', url })).body)).toEqual(first);
    await app.inject({ method: 'PUT', url: `/v1/hulls/${created.id}`, headers: { 'content-type': 'text/csv' }, payload: boxCsv('cached', 20, 4, 2) });
    const after = JSON.parse((await app.inject({ method: 'GET', url })).body);
    // A box of twice the length displaces twice the volume (V = L B T).
    expect(after.rows[0].volume).toBeRelClose(2 * first.rows[0].volume, 1e-12);
    await app.close();
  });
});
