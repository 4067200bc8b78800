import { PROFILE_SOURCES, type ProfileData, type TracePoint } from '@hopwise/common';
import { sql } from 'drizzle-orm';
import { index, integer, real, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { users } from '../schema.js';

// ISO 8601 UTC text timestamps, as in schema.ts.
const nowIso = sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`;

/** Where a stored profile came from (file name, sounding, feed item, …). */
export type ProfileProvenance = Record<string, unknown>;

/**
 * The profile library. `profile` is the validated ProfileData ({ layers } or { samples });
 * the fo*, hmF2 and TEC columns are derived from it with the physics core on every write
 * (api/src/profiles/profile-figures.ts) so lists and filters need no recomputation.
 */
export const profiles = sqliteTable(
  'profiles',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    ownerId: integer('owner_id')
      .notNull()
      .references(() => users.id),
    name: text('name').notNull(),
    source: text('source', { enum: PROFILE_SOURCES }).notNull(),
    validAtUtc: text('valid_at_utc'),
    latDeg: real('lat_deg'),
    lonDeg: real('lon_deg'),
    profile: text('profile', { mode: 'json' }).$type<ProfileData>().notNull(),
    foEMHz: real('fo_e_mhz'),
    foF1MHz: real('fo_f1_mhz'),
    foF2MHz: real('fo_f2_mhz').notNull(),
    hmF2Km: real('hm_f2_km').notNull(),
    verticalTecu: real('vertical_tecu').notNull(),
    published: integer('published', { mode: 'boolean' }).notNull().default(false),
    provenance: text('provenance', { mode: 'json' }).$type<ProfileProvenance>(),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
    deletedAt: text('deleted_at'),
  },
  (t) => [
    index('profiles_owner_idx').on(t.ownerId),
    index('profiles_published_idx').on(t.published),
    index('profiles_valid_at_idx').on(t.validAtUtc),
  ],
);

/** Vertical-incidence sounding traces (virtual height against frequency) uploaded by analysts. */
export const soundings = sqliteTable(
  'soundings',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    ownerId: integer('owner_id')
      .notNull()
      .references(() => users.id),
    name: text('name').notNull(),
    observedAtUtc: text('observed_at_utc').notNull(),
    latDeg: real('lat_deg').notNull(),
    lonDeg: real('lon_deg').notNull(),
    trace: text('trace', { mode: 'json' }).$type<TracePoint[]>().notNull(),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
    deletedAt: text('deleted_at'),
  },
  (t) => [index('soundings_owner_idx').on(t.ownerId)],
);

export type ProfileRow = typeof profiles.$inferSelect;
export type NewProfileRow = typeof profiles.$inferInsert;
export type SoundingRow = typeof soundings.$inferSelect;
export type NewSoundingRow = typeof soundings.$inferInsert;
