import { Inject, Injectable } from '@nestjs/common';
import { and, asc, desc, eq, isNull, max } from 'drizzle-orm';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import { users, type UserRow } from '../db/schema.js';
import { feedUpdates, type FeedUpdateRow } from '../db/schema/conditions.js';
import { profiles, type ProfileRow } from '../db/schema/profiles.js';

export type NewFeedUpdateRow = typeof feedUpdates.$inferInsert;

/** Storage of the feed bookkeeping (the profiles themselves go through ProfilesService). */
@Injectable()
export class ConditionsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  /** Runs `fn` in one (synchronous) transaction; nested writes join it as savepoints. */
  transaction<T>(fn: () => T): T {
    return this.db.transaction(() => fn());
  }

  /** The feed whose update was stored last, or undefined. */
  latestFeedId(): string | undefined {
    return this.db
      .select({ feedId: feedUpdates.feedId })
      .from(feedUpdates)
      .orderBy(desc(feedUpdates.id))
      .limit(1)
      .get()?.feedId;
  }

  lastSeq(feedId: string): number {
    const row = this.db
      .select({ seq: max(feedUpdates.seq) })
      .from(feedUpdates)
      .where(eq(feedUpdates.feedId, feedId))
      .get();
    return row?.seq ?? 0;
  }

  has(feedId: string, seq: number): boolean {
    return !!this.db
      .select({ id: feedUpdates.id })
      .from(feedUpdates)
      .where(and(eq(feedUpdates.feedId, feedId), eq(feedUpdates.seq, seq)))
      .get();
  }

  insert(row: NewFeedUpdateRow): FeedUpdateRow {
    return this.db.insert(feedUpdates).values(row).returning().get();
  }

  /** The site's first enabled admin (owner of feed profiles), if any. */
  feedOwner(): UserRow | undefined {
    return this.db
      .select()
      .from(users)
      .where(and(eq(users.role, 'admin'), eq(users.disabled, false)))
      .orderBy(asc(users.id))
      .limit(1)
      .get();
  }

  /** Latest stored update per region (by valid time, then arrival), with its live profile. */
  latestPerRegion(): { update: FeedUpdateRow; profile: ProfileRow }[] {
    const regions = this.db
      .selectDistinct({ region: feedUpdates.region })
      .from(feedUpdates)
      .all()
      .map((r) => r.region);
    return regions.flatMap((region) => {
      const row = this.db
        .select({ update: feedUpdates, profile: profiles })
        .from(feedUpdates)
        .innerJoin(profiles, eq(profiles.id, feedUpdates.profileId))
        .where(and(eq(feedUpdates.region, region), isNull(profiles.deletedAt)))
        .orderBy(desc(feedUpdates.validAtUtc), desc(feedUpdates.id))
        .limit(1)
        .get();
      return row ? [row] : [];
    });
  }
}
