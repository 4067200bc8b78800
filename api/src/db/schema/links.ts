import type { ProfileData, StudyProfileSource, StudyResult } from '@hopwise/common';
import { sql } from 'drizzle-orm';
import { index, integer, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { users } from '../schema.js';

// ISO 8601 UTC text timestamps, as in schema.ts.
const nowIso = sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`;

/** A station on the ground. Soft-deleted (`deleted_at`) because links and nets refer to it. */
export const stations = sqliteTable(
  'stations',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    ownerId: integer('owner_id')
      .notNull()
      .references(() => users.id),
    name: text('name').notNull(),
    /** Upper-cased, 3–12 of [A-Z0-9/]. */
    callSign: text('call_sign'),
    latDeg: real('lat_deg').notNull(),
    lonDeg: real('lon_deg').notNull(),
    elevationM: real('elevation_m'),
    notes: text('notes'),
    /** Shared stations are visible to every user (and usable in their links). */
    shared: integer('shared', { mode: 'boolean' }).notNull().default(false),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
    deletedAt: text('deleted_at'),
  },
  (t) => [
    // One live station per owner and name; deleted rows free the name.
    uniqueIndex('stations_owner_name_live_uq')
      .on(t.ownerId, t.name)
      .where(sql`${t.deletedAt} is null`),
    index('stations_shared_idx').on(t.shared),
  ],
);

/** A link between two stations; always private to its owner. */
export const links = sqliteTable(
  'links',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    ownerId: integer('owner_id')
      .notNull()
      .references(() => users.id),
    name: text('name').notNull(),
    fromStationId: integer('from_station_id')
      .notNull()
      .references(() => stations.id),
    toStationId: integer('to_station_id')
      .notNull()
      .references(() => stations.id),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
    deletedAt: text('deleted_at'),
  },
  (t) => [
    uniqueIndex('links_owner_name_live_uq')
      .on(t.ownerId, t.name)
      .where(sql`${t.deletedAt} is null`),
    index('links_from_station_idx').on(t.fromStationId),
    index('links_to_station_idx').on(t.toStationId),
  ],
);

/** A saved link study: the profile and frequencies used and the computed modes, as run. */
export const studies = sqliteTable(
  'studies',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    ownerId: integer('owner_id')
      .notNull()
      .references(() => users.id),
    linkId: integer('link_id')
      .notNull()
      .references(() => links.id),
    name: text('name'),
    /** The time the study is for (ISO 8601 UTC). */
    atUtc: text('at_utc').notNull(),
    /** What the user chose: a reference file, an inline profile, or a library profile. */
    profileSource: text('profile_source', { mode: 'json' }).$type<StudyProfileSource>().notNull(),
    /** The ProfileData actually used (a copy, so later library edits do not change the study). */
    profile: text('profile', { mode: 'json' }).$type<ProfileData>().notNull(),
    frequenciesMHz: text('frequencies_mhz', { mode: 'json' }).$type<number[]>().notNull(),
    result: text('result', { mode: 'json' }).$type<StudyResult>().notNull(),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
    deletedAt: text('deleted_at'),
  },
  (t) => [
    index('studies_link_at_idx').on(t.linkId, t.atUtc),
    index('studies_owner_idx').on(t.ownerId),
  ],
);

export type StationRow = typeof stations.$inferSelect;
export type NewStationRow = typeof stations.$inferInsert;
export type LinkRow = typeof links.$inferSelect;
export type NewLinkRow = typeof links.$inferInsert;
export type StudyRow = typeof studies.$inferSelect;
export type NewStudyRow = typeof studies.$inferInsert;
