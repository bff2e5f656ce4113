/**
 * The hull store: SQLite through better-sqlite3, one file under the data directory.
 *
 * Durability: WAL journal with synchronous=FULL, so a write acknowledged to a client
 * has reached the disk and survives a crash or power loss; every write is one
 * transaction, so a hull is either there whole or not at all. Each hull keeps its
 * upload byte for byte (BLOB) beside its sha256 and the model parsed from it (JSON).
 *
 * better-sqlite3 is synchronous: a request's reads and writes cannot interleave with
 * another's, which keeps each handler's view of a hull consistent without locks.
 *
 * One process owns the file: it keeps the metadata of recently used hulls in memory
 * (every lookup of a computation would otherwise be a query), updated by its own
 * writes. Another process may read the file, but must not write it while the service runs.
 */
import { createHash, randomBytes } from 'node:crypto';
import { closeSync, mkdirSync, openSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import type { HullModel } from '../../core/hull/hullModel.js';
import { Lru } from '../lru.js';
import { migrate } from './migrations.js';

/** How the offsets arrived: a CSV file in one of its forms, or a JSON model. */
export type HullForm = 'grid' | 'points' | 'model';

/** A model already written as JSON text (by a worker thread that read a large upload), with what the store keeps beside it. */
export interface SerialisedModel {
  readonly text: string;
  readonly name: string;
  readonly stationCount: number;
}

export interface NewHull {
  readonly model: HullModel | SerialisedModel;
  readonly mediaType: string;
  /** The upload as it arrived. */
  readonly source: Buffer;
  readonly form: HullForm;
  /** Length unit of the upload (a JSON model is in m). */
  readonly units: string;
}

/** What the store says of a hull without reading its model. */
export interface HullMeta {
  readonly id: string;
  readonly name: string;
  readonly created: string;
  readonly updated: string;
  /** sha256 of the stored upload, hex. */
  readonly hash: string;
  readonly stations: number;
  readonly form: HullForm;
  readonly units: string;
  readonly mediaType: string;
  /** Size of the stored upload, bytes. */
  readonly bytes: number;
}

export interface StoredHull extends HullMeta {
  readonly model: HullModel;
}

export const STORE_FILE = 'hulls.sqlite3';

/** Hull metadata kept in memory, most recently used. */
const META_CACHE_SIZE = 1024;

export function sha256(bytes: Buffer | string): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** 16 url-safe characters, 96 random bits. */
export function newHullId(): string {
  return randomBytes(12).toString('base64url');
}

interface MetaRow {
  id: string;
  name: string;
  created: string;
  updated: string;
  source_hash: string;
  stations: number;
  form: string;
  units: string;
  media_type: string;
  bytes: number;
}

const META_COLUMNS = 'id, name, created, updated, source_hash, stations, form, units, media_type, length(source) AS bytes';

const toMeta = (r: MetaRow): HullMeta => ({
  id: r.id,
  name: r.name,
  created: r.created,
  updated: r.updated,
  hash: r.source_hash,
  stations: r.stations,
  form: r.form as HullForm,
  units: r.units,
  mediaType: r.media_type,
  bytes: r.bytes,
});

export class HullStore {
  private readonly db: Database.Database;
  private readonly stmt;
  private readonly metaCache = new Lru<string, HullMeta>(META_CACHE_SIZE);

  /** Open (creating if need be) the store in `dataDir`, or in memory for ':memory:'. */
  static open(dataDir: string): HullStore {
    if (dataDir === ':memory:') return new HullStore(new Database(':memory:'));
    // The hulls are the users' work: readable by the service's owner only. SQLite gives
    // its -wal and -shm files the mode of the database file.
    mkdirSync(dataDir, { recursive: true, mode: 0o700 });
    const file = join(dataDir, STORE_FILE);
    closeSync(openSync(file, 'a', 0o600));
    return new HullStore(new Database(file));
  }

  private constructor(db: Database.Database) {
    this.db = db;
    db.pragma('journal_mode = WAL');
    db.pragma('synchronous = FULL');
    db.pragma('busy_timeout = 5000');
    migrate(db);
    this.stmt = {
      insert: db.prepare(
        `INSERT INTO hulls (id, name, created, updated, media_type, source, source_hash, model, form, units, stations)
         VALUES (@id, @name, @created, @updated, @mediaType, @source, @hash, @model, @form, @units, @stations)`,
      ),
      update: db.prepare(
        `UPDATE hulls SET name = @name, updated = @updated, media_type = @mediaType, source = @source, source_hash = @hash,
         model = @model, form = @form, units = @units, stations = @stations WHERE id = @id`,
      ),
      remove: db.prepare('DELETE FROM hulls WHERE id = ?'),
      meta: db.prepare<[string], MetaRow>(`SELECT ${META_COLUMNS} FROM hulls WHERE id = ?`),
      model: db.prepare<[string], MetaRow & { model: string }>(`SELECT ${META_COLUMNS}, model FROM hulls WHERE id = ?`),
      source: db.prepare<[string], { media_type: string; source: Buffer }>('SELECT media_type, source FROM hulls WHERE id = ?'),
      modelText: db.prepare<[string], { model: string }>('SELECT model FROM hulls WHERE id = ?'),
      // Oldest first; hulls stored within the same millisecond in the order they were stored.
      list: db.prepare<[], MetaRow>(`SELECT ${META_COLUMNS} FROM hulls ORDER BY created, rowid`),
      byHash: db.prepare<[string], MetaRow>(`SELECT ${META_COLUMNS} FROM hulls WHERE source_hash = ? ORDER BY created, rowid`),
      count: db.prepare<[], { n: number }>('SELECT count(*) AS n FROM hulls'),
    };
  }

  private row(id: string, h: NewHull, now: string) {
    const m = h.model;
    return {
      id,
      name: m.name,
      updated: now,
      mediaType: h.mediaType,
      source: h.source,
      hash: sha256(h.source),
      model: 'text' in m ? m.text : JSON.stringify(m),
      form: h.form,
      units: h.units,
      stations: 'text' in m ? m.stationCount : m.stations.length,
    };
  }

  /** Store a new hull under a fresh id (or `id`, for the demo hulls); committed to disk on return. */
  create(h: NewHull, id: string = newHullId()): HullMeta {
    const now = new Date().toISOString();
    this.db.transaction(() => this.stmt.insert.run({ ...this.row(id, h, now), created: now }))();
    this.metaCache.delete(id);
    return this.meta(id)!;
  }

  /** Replace a stored hull, keeping its id and creation time; undefined when there is none. */
  replace(id: string, h: NewHull): HullMeta | undefined {
    const changed = this.db.transaction(() => this.stmt.update.run(this.row(id, h, new Date().toISOString())).changes)();
    this.metaCache.delete(id);
    return changed === 0 ? undefined : this.meta(id);
  }

  /** Remove a hull; false when there was none. */
  delete(id: string): boolean {
    const removed = this.db.transaction(() => this.stmt.remove.run(id).changes)() > 0;
    this.metaCache.delete(id);
    return removed;
  }

  meta(id: string): HullMeta | undefined {
    const cached = this.metaCache.get(id);
    if (cached !== undefined) return cached;
    const r = this.stmt.meta.get(id);
    if (r === undefined) return undefined;
    const m = toMeta(r);
    this.metaCache.set(id, m);
    return m;
  }

  get(id: string): StoredHull | undefined {
    const r = this.stmt.model.get(id);
    return r === undefined ? undefined : { ...toMeta(r), model: JSON.parse(r.model) as HullModel };
  }

  /** The stored model as its JSON text, not parsed (a worker thread parses it). */
  modelText(id: string): string | undefined {
    return this.stmt.modelText.get(id)?.model;
  }

  /** The upload as it arrived. */
  source(id: string): { mediaType: string; bytes: Buffer } | undefined {
    const r = this.stmt.source.get(id);
    return r === undefined ? undefined : { mediaType: r.media_type, bytes: r.source };
  }

  list(): HullMeta[] {
    return this.stmt.list.all().map(toMeta);
  }

  findByHash(hash: string): HullMeta[] {
    return this.stmt.byHash.all(hash).map(toMeta);
  }

  count(): number {
    return this.stmt.count.get()!.n;
  }

  /** The durability settings in force on this connection (journal mode, and synchronous: 2 is FULL). */
  settings(): { journalMode: string; synchronous: number; schemaVersion: number } {
    return {
      journalMode: this.db.pragma('journal_mode', { simple: true }) as string,
      synchronous: this.db.pragma('synchronous', { simple: true }) as number,
      schemaVersion: this.db.pragma('user_version', { simple: true }) as number,
    };
  }

  close(): void {
    if (this.db.open) this.db.close();
  }
}
