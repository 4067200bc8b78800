import { Inject, Injectable } from '@nestjs/common';
import { and, asc, count, desc, eq, gte, isNull, lte, type SQL } from 'drizzle-orm';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import { auditLog, links, studies, type StudyRow } from '../db/schema.js';
import type { Viewer } from '../stations/station-access.js';
import type { AuditEntry } from '../stations/stations.repository.js';
import { StudiesRepository, type NewStudy, type StudyFilter } from './studies.repository.js';

@Injectable()
export class DrizzleStudiesRepository extends StudiesRepository {
  constructor(@Inject(DB) private readonly db: Db) {
    super();
  }

  private live(): SQL {
    return and(isNull(studies.deletedAt), isNull(links.deletedAt)) as SQL;
  }

  findById(id: number): StudyRow | undefined {
    return this.db
      .select({ study: studies })
      .from(studies)
      .innerJoin(links, eq(links.id, studies.linkId))
      .where(and(eq(studies.id, id), this.live()))
      .get()?.study;
  }

  list(viewer: Viewer, filter: StudyFilter) {
    const where = and(
      this.live(),
      viewer.seesAll ? undefined : eq(studies.ownerId, viewer.userId),
      filter.linkId === undefined ? undefined : eq(studies.linkId, filter.linkId),
      filter.fromUtc === undefined ? undefined : gte(studies.atUtc, filter.fromUtc),
      filter.toUtc === undefined ? undefined : lte(studies.atUtc, filter.toUtc),
    );
    const dir = filter.order === 'asc' ? asc : desc;
    const rows = this.db
      .select({ study: studies })
      .from(studies)
      .innerJoin(links, eq(links.id, studies.linkId))
      .where(where)
      .orderBy(dir(filter.sort === 'atUtc' ? studies.atUtc : studies.createdAt), dir(studies.id))
      .limit(filter.limit)
      .offset(filter.offset)
      .all()
      .map((r) => r.study);
    const total =
      this.db
        .select({ n: count() })
        .from(studies)
        .innerJoin(links, eq(links.id, studies.linkId))
        .where(where)
        .get()?.n ?? 0;
    return { rows, total };
  }

  latestOfLink(viewer: Viewer, linkId: number): StudyRow | undefined {
    return this.db
      .select({ study: studies })
      .from(studies)
      .innerJoin(links, eq(links.id, studies.linkId))
      .where(
        and(
          this.live(),
          eq(studies.linkId, linkId),
          viewer.seesAll ? undefined : eq(studies.ownerId, viewer.userId),
        ),
      )
      .orderBy(desc(studies.createdAt), desc(studies.id))
      .get()?.study;
  }

  private audit(tx: Pick<Db, 'insert'>, id: number, audit: AuditEntry): void {
    tx.insert(auditLog)
      .values({
        actorUserId: audit.actorUserId,
        action: audit.action,
        target: `study:${id}`,
        detail: audit.detail ?? null,
      })
      .run();
  }

  create(study: NewStudy, audit: AuditEntry): StudyRow {
    return this.db.transaction((tx) => {
      const row = tx.insert(studies).values(study).returning().get();
      this.audit(tx, row.id, audit);
      return row;
    });
  }

  update(id: number, patch: { name: string | null }, audit: AuditEntry): StudyRow | undefined {
    return this.db.transaction((tx) => {
      const row = tx
        .update(studies)
        .set({ ...patch, updatedAt: new Date().toISOString() })
        .where(and(eq(studies.id, id), isNull(studies.deletedAt)))
        .returning()
        .get();
      if (row) this.audit(tx, id, audit);
      return row;
    });
  }

  softDelete(id: number, audit: AuditEntry): boolean {
    return this.db.transaction((tx) => {
      const now = new Date().toISOString();
      const row = tx
        .update(studies)
        .set({ deletedAt: now, updatedAt: now })
        .where(and(eq(studies.id, id), isNull(studies.deletedAt)))
        .returning({ id: studies.id })
        .get();
      if (row) this.audit(tx, id, audit);
      return row !== undefined;
    });
  }
}
