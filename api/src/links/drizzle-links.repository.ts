import { Inject, Injectable } from '@nestjs/common';
import { and, asc, count, eq, isNull, ne, or, sql, type SQL } from 'drizzle-orm';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import { auditLog, links, studies, users, type LinkRow } from '../db/schema.js';
import { isUniqueViolation, type Viewer } from '../stations/station-access.js';
import type { AuditEntry } from '../stations/stations.repository.js';
import {
  LinkNameTakenError,
  LinksRepository,
  type LinkFilter,
  type LinkPatch,
  type LinkWithOwner,
  type NewLink,
} from './links.repository.js';
import { byShape, flags } from '../db/query-shapes.js';

const withOwner = { link: links, ownerName: users.displayName };
const flatten = (r: { link: LinkRow; ownerName: string | null }): LinkWithOwner => ({
  ...r.link,
  ownerName: r.ownerName ?? '',
});

@Injectable()
export class DrizzleLinksRepository extends LinksRepository {
  constructor(@Inject(DB) private readonly db: Db) {
    super();
  }

  findById(id: number): LinkWithOwner | undefined {
    const r = this.db
      .select(withOwner)
      .from(links)
      .leftJoin(users, eq(users.id, links.ownerId))
      .where(and(eq(links.id, id), isNull(links.deletedAt)))
      .get();
    return r ? flatten(r) : undefined;
  }

  /** List and count, prepared per shape: sees all / station filter (see db/query-shapes). */
  private readonly listQueries = byShape((shape) => {
    const [seesAll, byStation] = [...shape].map((c) => c === '1');
    const stationId = sql.placeholder('stationId');
    const conditions: (SQL | undefined)[] = [isNull(links.deletedAt)];
    if (!seesAll) conditions.push(eq(links.ownerId, sql.placeholder('userId')));
    if (byStation) {
      conditions.push(or(eq(links.fromStationId, stationId), eq(links.toStationId, stationId)));
    }
    const where = and(...conditions);
    return {
      rows: this.db
        .select(withOwner)
        .from(links)
        .leftJoin(users, eq(users.id, links.ownerId))
        .where(where)
        .orderBy(sql`${links.name} collate nocase`, asc(links.id))
        .limit(sql.placeholder('limit'))
        .offset(sql.placeholder('offset'))
        .prepare(),
      total: this.db.select({ n: count() }).from(links).where(where).prepare(),
    };
  });

  list(viewer: Viewer, filter: LinkFilter) {
    const query = this.listQueries(flags(viewer.seesAll, filter.stationId !== undefined));
    const values = {
      userId: viewer.userId,
      stationId: filter.stationId ?? 0,
      limit: filter.limit,
      offset: filter.offset,
    };
    return {
      rows: query.rows.all(values).map(flatten),
      total: query.total.get(values)?.n ?? 0,
    };
  }

  findByOwnerAndName(ownerId: number, name: string, exceptId?: number): LinkRow | undefined {
    return this.db
      .select()
      .from(links)
      .where(
        and(
          eq(links.ownerId, ownerId),
          isNull(links.deletedAt),
          sql`lower(${links.name}) = lower(${name})`,
          exceptId === undefined ? undefined : ne(links.id, exceptId),
        ),
      )
      .get();
  }

  private audit(tx: Pick<Db, 'insert'>, id: number, audit: AuditEntry): void {
    tx.insert(auditLog)
      .values({
        actorUserId: audit.actorUserId,
        action: audit.action,
        target: `link:${id}`,
        detail: audit.detail ?? null,
      })
      .run();
  }

  create(link: NewLink, audit: AuditEntry): LinkWithOwner {
    try {
      const id = this.db.transaction((tx) => {
        const row = tx.insert(links).values(link).returning({ id: links.id }).get();
        this.audit(tx, row.id, audit);
        return row.id;
      });
      return this.findById(id) as LinkWithOwner;
    } catch (err) {
      if (isUniqueViolation(err)) throw new LinkNameTakenError(link.name);
      throw err;
    }
  }

  update(id: number, patch: LinkPatch, audit: AuditEntry): LinkWithOwner | undefined {
    try {
      const updated = this.db.transaction((tx) => {
        const row = tx
          .update(links)
          .set({ ...patch, updatedAt: new Date().toISOString() })
          .where(and(eq(links.id, id), isNull(links.deletedAt)))
          .returning({ id: links.id })
          .get();
        if (!row) return false;
        this.audit(tx, id, audit);
        return true;
      });
      return updated ? this.findById(id) : undefined;
    } catch (err) {
      if (isUniqueViolation(err)) throw new LinkNameTakenError(patch.name ?? '');
      throw err;
    }
  }

  softDelete(id: number, audit: AuditEntry): { deleted: boolean; studies: number } {
    return this.db.transaction((tx) => {
      const now = new Date().toISOString();
      const row = tx
        .update(links)
        .set({ deletedAt: now, updatedAt: now })
        .where(and(eq(links.id, id), isNull(links.deletedAt)))
        .returning({ id: links.id })
        .get();
      if (!row) return { deleted: false, studies: 0 };
      // A study has no meaning without its link: they go together.
      const gone = tx
        .update(studies)
        .set({ deletedAt: now, updatedAt: now })
        .where(and(eq(studies.linkId, id), isNull(studies.deletedAt)))
        .returning({ id: studies.id })
        .all();
      this.audit(tx, id, { ...audit, detail: { ...audit.detail, studies: gone.length } });
      return { deleted: true, studies: gone.length };
    });
  }
}
