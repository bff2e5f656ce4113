/**
 * The store's schema as an ordered list of migrations. The database's
 * `PRAGMA user_version` is the number of the last one applied; opening a store applies
 * those above it, each in its own transaction together with the version bump, so a
 * crash leaves the schema at one version or the next, never between. A file whose
 * version is above the last one known was written by a newer release and is not
 * touched.
 *
 * Never edit a migration that has shipped: add the next one.
 */
import type Database from 'better-sqlite3';

export interface Migration {
  readonly version: number;
  readonly description: string;
  readonly sql: string;
}

export const MIGRATIONS: readonly Migration[] = [
  {
    version: 1,
    description: 'hulls: the upload byte for byte, its sha256, the parsed model as JSON',
    sql: `
      CREATE TABLE hulls (
        id          TEXT PRIMARY KEY NOT NULL,
        name        TEXT NOT NULL,
        created     TEXT NOT NULL,
        updated     TEXT NOT NULL,
        media_type  TEXT NOT NULL,
        source      BLOB NOT NULL,
        source_hash TEXT NOT NULL,
        model       TEXT NOT NULL,
        form        TEXT NOT NULL,
        units       TEXT NOT NULL,
        stations    INTEGER NOT NULL
      ) STRICT;
      CREATE INDEX hulls_source_hash ON hulls (source_hash);
      CREATE INDEX hulls_created ON hulls (created, id);
    `,
  },
];

export const SCHEMA_VERSION = MIGRATIONS[MIGRATIONS.length - 1]?.version ?? 0;

export function schemaVersion(db: Database.Database): number {
  return db.pragma('user_version', { simple: true }) as number;
}

/** Bring the schema up to SCHEMA_VERSION; returns the versions before and after. */
export function migrate(db: Database.Database, migrations: readonly Migration[] = MIGRATIONS): { from: number; to: number } {
  const from = schemaVersion(db);
  const last = migrations[migrations.length - 1]?.version ?? 0;
  if (from > last) {
    throw new Error(`the hull store is at schema version ${from}, written by a newer Halfbreadth; this one knows versions up to ${last} and leaves it untouched`);
  }
  for (const m of migrations) {
    if (m.version <= from) continue;
    db.transaction(() => {
      db.exec(m.sql);
      db.pragma(`user_version = ${m.version}`);
    })();
  }
  return { from, to: schemaVersion(db) };
}
