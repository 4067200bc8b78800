import { Inject, Injectable } from '@nestjs/common';
import { and, count, desc, eq, like, or, type SQL } from 'drizzle-orm';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import { auditLog, users } from '../db/schema.js';
import type { AuditEntryView } from './audit-entry-view.js';
import { AuditRepository, type AuditFilter } from './audit.repository.js';

/** `%` and `_` are LIKE wildcards; the query DTO allows `_`, so escape it. */
const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

@Injectable()
export class DrizzleAuditRepository extends AuditRepository {
  constructor(@Inject(DB) private readonly db: Db) {
    super();
  }

  list(filter: AuditFilter): { rows: AuditEntryView[]; total: number } {
    const where: SQL[] = [];
    if (filter.action) {
      const action = or(
        eq(auditLog.action, filter.action),
        like(auditLog.action, `${escapeLike(filter.action)}.%`),
      );
      if (action) where.push(action);
    }
    if (filter.actorUserId !== undefined) where.push(eq(auditLog.actorUserId, filter.actorUserId));
    if (filter.target) where.push(eq(auditLog.target, filter.target));
    const condition = where.length > 0 ? and(...where) : undefined;

    const rows = this.db
      .select({
        id: auditLog.id,
        at: auditLog.at,
        actorUserId: auditLog.actorUserId,
        actorEmail: users.email,
        actorName: users.displayName,
        action: auditLog.action,
        target: auditLog.target,
        detail: auditLog.detail,
      })
      .from(auditLog)
      .leftJoin(users, eq(users.id, auditLog.actorUserId))
      .where(condition)
      .orderBy(desc(auditLog.at), desc(auditLog.id))
      .limit(filter.limit)
      .offset(filter.offset)
      .all();
    const total = this.db.select({ n: count() }).from(auditLog).where(condition).get()?.n ?? 0;
    return {
      rows: rows.map((r) => ({
        ...r,
        actorEmail: r.actorEmail ?? null,
        actorName: r.actorName ?? null,
        detail: r.detail ?? null,
      })),
      total,
    };
  }
}
