import { sql } from 'drizzle-orm';
import { index, integer, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { users } from '../schema.js';
import { profiles } from './profiles.js';

// ISO 8601 UTC text timestamps, as in schema.ts.
const nowIso = sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`;

/**
 * Conditions-feed updates taken in, one row per (feed, seq), written in the same transaction as
 * the profile it became: the unique index makes a second copy impossible, and the highest seq per
 * feed is where the next poll resumes.
 */
export const feedUpdates = sqliteTable(
  'feed_updates',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    /** Owner of the stored profile (the site's first admin: feed data belongs to the site). */
    ownerId: integer('owner_id')
      .notNull()
      .references(() => users.id),
    /** Identity of the feed instance (a restarted feed numbers its updates again from 1). */
    feedId: text('feed_id').notNull(),
    seq: integer('seq').notNull(),
    region: text('region').notNull(),
    latDeg: real('lat_deg').notNull(),
    lonDeg: real('lon_deg').notNull(),
    validAtUtc: text('valid_at_utc').notNull(),
    profileId: integer('profile_id')
      .notNull()
      .references(() => profiles.id),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
  },
  (t) => [
    uniqueIndex('feed_updates_feed_seq_uq').on(t.feedId, t.seq),
    index('feed_updates_region_valid_idx').on(t.region, t.validAtUtc),
  ],
);

export type FeedUpdateRow = typeof feedUpdates.$inferSelect;
