import { Inject, Injectable } from '@nestjs/common';
import { and, asc, count, desc, eq, gte, isNull, lte, or, type SQL } from 'drizzle-orm';
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

  list(viewer: Viewer, filter: ProfileFilter, page: { limit: number; offset: number }) {
    const where: (SQL | undefined)[] = [isNull(profiles.deletedAt)];
    if (!viewer.seesAll) {
      where.push(or(eq(profiles.ownerId, viewer.userId), eq(profiles.published, true)));
    }
    if (filter.source) where.push(eq(profiles.source, filter.source));
    if (filter.ownerId !== undefined) where.push(eq(profiles.ownerId, filter.ownerId));
    if (filter.published !== undefined) where.push(eq(profiles.published, filter.published));
    if (filter.fromUtc) where.push(gte(profiles.validAtUtc, filter.fromUtc));
    if (filter.toUtc) where.push(lte(profiles.validAtUtc, filter.toUtc));
    if (filter.bbox) {
      const [minLon, minLat, maxLon, maxLat] = filter.bbox;
      where.push(gte(profiles.latDeg, minLat), lte(profiles.latDeg, maxLat));
      where.push(
        minLon <= maxLon
          ? and(gte(profiles.lonDeg, minLon), lte(profiles.lonDeg, maxLon))
          : or(gte(profiles.lonDeg, minLon), lte(profiles.lonDeg, maxLon)),
      );
    }
    const condition = and(...where);
    const rows = this.selectWithOwner()
      .where(condition)
      .orderBy(desc(profiles.validAtUtc), asc(profiles.id))
      .limit(page.limit)
      .offset(page.offset)
      .all()
      .map((r) => ({ ...r.profile, ownerName: r.ownerName }));
    const total = this.db.select({ n: count() }).from(profiles).where(condition).get()?.n ?? 0;
    return { rows, total };
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
