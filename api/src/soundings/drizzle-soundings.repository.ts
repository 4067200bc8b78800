import { Inject, Injectable } from '@nestjs/common';
import { and, count, desc, eq, isNull, type SQL } from 'drizzle-orm';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import { auditLog } from '../db/schema.js';
import { soundings, type NewSoundingRow, type SoundingRow } from '../db/schema/profiles.js';
import type { AuditEntry, Viewer } from '../profiles/profiles.repository.js';
import { SoundingsRepository, type SoundingPatch } from './soundings.repository.js';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

function writeAudit(tx: Tx, id: number, audit: AuditEntry): void {
  tx.insert(auditLog)
    .values({
      actorUserId: audit.actorUserId,
      action: audit.action,
      target: `sounding:${id}`,
      detail: audit.detail ?? null,
    })
    .run();
}

@Injectable()
export class DrizzleSoundingsRepository extends SoundingsRepository {
  constructor(@Inject(DB) private readonly db: Db) {
    super();
  }

  findById(id: number): SoundingRow | undefined {
    return this.db
      .select()
      .from(soundings)
      .where(and(eq(soundings.id, id), isNull(soundings.deletedAt)))
      .get();
  }

  list(viewer: Viewer, filter: { ownerId?: number }, page: { limit: number; offset: number }) {
    const where: (SQL | undefined)[] = [isNull(soundings.deletedAt)];
    if (!viewer.seesAll) where.push(eq(soundings.ownerId, viewer.userId));
    if (filter.ownerId !== undefined) where.push(eq(soundings.ownerId, filter.ownerId));
    const condition = and(...where);
    const rows = this.db
      .select()
      .from(soundings)
      .where(condition)
      .orderBy(desc(soundings.observedAtUtc), desc(soundings.id))
      .limit(page.limit)
      .offset(page.offset)
      .all();
    const total = this.db.select({ n: count() }).from(soundings).where(condition).get()?.n ?? 0;
    return { rows, total };
  }

  create(row: NewSoundingRow, audit: AuditEntry): SoundingRow {
    return this.db.transaction((tx) => {
      const created = tx.insert(soundings).values(row).returning().get();
      writeAudit(tx, created.id, audit);
      return created;
    });
  }

  update(id: number, patch: SoundingPatch, audit: AuditEntry): SoundingRow | undefined {
    return this.db.transaction((tx) => {
      const row = tx
        .update(soundings)
        .set({ ...patch, updatedAt: new Date().toISOString() })
        .where(and(eq(soundings.id, id), isNull(soundings.deletedAt)))
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
        .update(soundings)
        .set({ deletedAt: now, updatedAt: now })
        .where(and(eq(soundings.id, id), isNull(soundings.deletedAt)))
        .returning({ id: soundings.id })
        .get();
      if (!row) return false;
      writeAudit(tx, id, audit);
      return true;
    });
  }

  count(): number {
    return this.db.select({ n: count() }).from(soundings).get()?.n ?? 0;
  }
}
