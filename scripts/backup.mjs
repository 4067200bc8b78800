#!/usr/bin/env node
// Online backup of the Hopwise SQLite file with SQLite's backup API (better-sqlite3 `db.backup`):
// safe while the service runs (WAL readers do not block it), consistent to one instant.
//   node scripts/backup.mjs [--db <file>] [--dir <backup folder>] [--keep-days <n>]
// Defaults: HOPWISE_DB_FILE (else data/hopwise.sqlite), HOPWISE_BACKUP_DIR (else data/backups),
// HOPWISE_BACKUP_KEEP_DAYS (else 14). Writes hopwise-YYYYMMDDTHHMMSSZ.sqlite, checks it with
// PRAGMA integrity_check, then deletes backups older than the kept days. Exit 1 on any failure.
import Database from 'better-sqlite3';
import { mkdirSync, readdirSync, renameSync, rmSync, statSync } from 'node:fs';
import path from 'node:path';

const arg = (name) => {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? process.argv[i + 1] : undefined;
};
const dbFile = path.resolve(arg('db') ?? process.env.HOPWISE_DB_FILE ?? 'data/hopwise.sqlite');
const dir = path.resolve(arg('dir') ?? process.env.HOPWISE_BACKUP_DIR ?? 'data/backups');
const keepDays = Number(arg('keep-days') ?? process.env.HOPWISE_BACKUP_KEEP_DAYS ?? 14);
if (!Number.isFinite(keepDays) || keepDays < 1) {
  console.error('keep-days must be a number ≥ 1');
  process.exit(1);
}

mkdirSync(dir, { recursive: true });
const stamp = new Date()
  .toISOString()
  .replace(/[-:]/g, '')
  .replace(/\.\d+Z$/, 'Z');
const target = path.join(dir, `hopwise-${stamp}.sqlite`);
const partial = `${target}.partial`;

const source = new Database(dbFile, { readonly: true, fileMustExist: true });
try {
  await source.backup(partial);
} finally {
  source.close();
}
// A stand-alone file: rollback journal instead of WAL, so no -wal/-shm files travel with it.
const check = new Database(partial);
check.pragma('journal_mode = DELETE');
const ok = check.pragma('integrity_check', { simple: true });
check.close();
if (ok !== 'ok') {
  rmSync(partial, { force: true });
  console.error(`backup failed integrity_check: ${ok}`);
  process.exit(1);
}
renameSync(partial, target);
console.log(`backup written: ${target} (${(statSync(target).size / 1024).toFixed(0)} KiB)`);

const cutoffMs = Date.now() - keepDays * 86_400_000;
for (const name of readdirSync(dir)) {
  if (!/^hopwise-\d{8}T\d{6}Z\.sqlite$/.test(name)) continue;
  const file = path.join(dir, name);
  if (statSync(file).mtimeMs < cutoffMs) {
    rmSync(file);
    console.log(`removed old backup: ${name}`);
  }
}
