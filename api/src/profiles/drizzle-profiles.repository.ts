import { Inject, Injectable } from '@nestjs/common';
import { and, asc, count, desc, eq, gte, isNull, lte, or, sql, type SQL } from 'drizzle-orm';
import { byShape, flags } from '../db/query-shapes.js';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import { auditLog, users } from '../db/schema.js';
import { profiles, type NewProfileRow, type ProfileRow } from '../db/schema/profiles.js';
import {
  ProfilesRepository,
  type AuditEntry,
  type ProfileFilter,
  type ProfilePatch,
  type ProfileWithOwner,
  type Viewer,
} from './profiles.repository.js';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

function writeAudit(tx: Tx, id: number, audit: AuditEntry): void {
  tx.insert(auditLog)
    .values({
      actorUserId: audit.actorUserId,
      action: audit.action,
      target: `profile:${id}`,
      detail: audit.detail ?? null,
    })
    .run();
}

@Injectable()
export class DrizzleProfilesRepository extends ProfilesRepository {
  constructor(@Inject(DB) private readonly db: Db) {
    super();
  }

  private selectWithOwner() {
    return this.db
      .select({ profile: profiles, ownerName: users.displayName })
      .from(profiles)
      .innerJoin(users, eq(users.id, profiles.ownerId));
  }

  findById(id: number): ProfileWithOwner | undefined {
    const r = this.selectWithOwner()
      .where(and(eq(profiles.id, id), isNull(profiles.deletedAt)))
      .get();
    return r ? { ...r.profile, ownerName: r.ownerName } : undefined;
  }

  /**
   * List and count, prepared per shape (see db/query-shapes): sees all, then which filters are
   * present, and whether the bbox crosses the antimeridian.
   */
  private readonly listQueries = byShape((shape) => {
    const [seesAll, source, owner, published, from, to, bbox, wraps] = [...shape].map(
      (c) => c === '1',
    );
    const p = sql.placeholder;
    const where: (SQL | undefined)[] = [isNull(profiles.deletedAt)];
    if (!seesAll) {
      where.push(or(eq(profiles.ownerId, p('userId')), eq(profiles.published, true)));
    }
    if (source) where.push(eq(profiles.source, p('source')));
    if (owner) where.push(eq(profiles.ownerId, p('ownerId')));
    if (published) where.push(eq(profiles.published, p('published')));
    if (from) where.push(gte(profiles.validAtUtc, p('fromUtc')));
    if (to) where.push(lte(profiles.validAtUtc, p('toUtc')));
    if (bbox) {
      where.push(gte(profiles.latDeg, p('minLat')), lte(profiles.latDeg, p('maxLat')));
      where.push(
        wraps
          ? or(gte(profiles.lonDeg, p('minLon')), lte(profiles.lonDeg, p('maxLon')))
          : and(gte(profiles.lonDeg, p('minLon')), lte(profiles.lonDeg, p('maxLon'))),
      );
    }
    const condition = and(...where);
    return {
      rows: this.selectWithOwner()
        .where(condition)
        .orderBy(desc(profiles.validAtUtc), asc(profiles.id))
        .limit(p('limit'))
        .offset(p('offset'))
        .prepare(),
      total: this.db.select({ n: count() }).from(profiles).where(condition).prepare(),
    };
  });

  list(viewer: Viewer, filter: ProfileFilter, page: { limit: number; offset: number }) {
    const [minLon, minLat, maxLon, maxLat] = filter.bbox ?? [0, 0, 0, 0];
    const query = this.listQueries(
      flags(
        viewer.seesAll,
        filter.source,
        filter.ownerId !== undefined,
        filter.published !== undefined,
        filter.fromUtc,
        filter.toUtc,
        filter.bbox,
        minLon > maxLon,
      ),
    );
    const values = {
      userId: viewer.userId,
      source: filter.source ?? '',
      ownerId: filter.ownerId ?? 0,
      // SQLite stores booleans as 0/1; a placeholder is bound as given.
      published: filter.published ? 1 : 0,
      fromUtc: filter.fromUtc ?? '',
      toUtc: filter.toUtc ?? '',
      minLat,
      maxLat,
      minLon,
      maxLon,
      limit: page.limit,
      offset: page.offset,
    };
    return {
      rows: query.rows.all(values).map((r) => ({ ...r.profile, ownerName: r.ownerName })),
      total: query.total.get(values)?.n ?? 0,
    };
  }

  create(row: NewProfileRow, audit: AuditEntry): ProfileRow {
    // better-sqlite3 transactions are synchronous: the row and its audit entry commit together.
    return this.db.transaction((tx) => {
      const created = tx.insert(profiles).values(row).returning().get();
      writeAudit(tx, created.id, audit);
      return created;
    });
  }

  update(id: number, patch: ProfilePatch, audit: AuditEntry): ProfileRow | undefined {
    return this.db.transaction((tx) => {
      const row = tx
        .update(profiles)
        .set({ ...patch, updatedAt: new Date().toISOString() })
        .where(and(eq(profiles.id, id), isNull(profiles.deletedAt)))
        .returning()
        .get();
      if (!row) return undefined;
      writeAudit(tx, id, audit);
      return row;
    });
  }

  softDelete(id: number, audit: AuditEntry): boolean {
    return this.db.transaction((tx) => {
      const now = new Date().toISOString();
      const row = tx
        .update(profiles)
        .set({ deletedAt: now, updatedAt: now })
        .where(and(eq(profiles.id, id), isNull(profiles.deletedAt)))
        .returning({ id: profiles.id })
        .get();
      if (!row) return false;
      writeAudit(tx, id, audit);
      return true;
    });
  }

  count(): number {
    return this.db.select({ n: count() }).from(profiles).get()?.n ?? 0;
  }
}
