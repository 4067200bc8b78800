import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { drizzle, type BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import { LRUCache } from 'lru-cache';
import * as schema from './schema.js';

export type Db = BetterSQLite3Database<typeof schema> & { $client: Database.Database };

/** Repo-root `drizzle/` (same depth from api/src/db and api/dist/db). */
export const MIGRATIONS_FOLDER = fileURLToPath(new URL('../../../drizzle/', import.meta.url));

/** Compiled statements kept per connection (the app issues a few dozen distinct SQL texts). */
const STATEMENT_CACHE_SIZE = 256;

/**
 * Drizzle calls `prepare()` for every query it runs, and better-sqlite3 compiles the SQL each
 * time; the same few dozen SQL texts repeat. Keep compiled statements in a bounded LRU keyed by
 * the SQL text and hand them back reset (Drizzle switches reader statements to raw mode and back
 * per call). A statement still being iterated (`busy`) is never handed out twice.
 */
export function cacheStatements(sqlite: Database.Database, size = STATEMENT_CACHE_SIZE): void {
  const prepare = sqlite.prepare.bind(sqlite);
  const cache = new LRUCache<string, Database.Statement>({ max: size });
  sqlite.prepare = ((source: string) => {
    const cached = cache.get(source);
    if (cached && !cached.busy) return cached.reader ? cached.raw(false) : cached;
    const stmt = prepare(source);
    cache.set(source, stmt);
    return stmt;
  }) as typeof sqlite.prepare;
}

/** Opens (creating its folder) and migrates the SQLite file (STACK gotcha 6). */
export function openDatabase(file: string): Db {
  mkdirSync(dirname(file), { recursive: true });
  const sqlite = new Database(file);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  cacheStatements(sqlite);
  const db = drizzle(sqlite, { schema });
  migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
  return db;
}
