import { Inject, Injectable } from '@nestjs/common';
import { and, asc, count, eq, inArray, isNull, ne, or, sql, type SQL } from 'drizzle-orm';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import {
  auditLog,
  links,
  netMembers,
  nets,
  stations,
  users,
  type StationRow,
} from '../db/schema.js';
import { byShape, flags } from '../db/query-shapes.js';
import { isUniqueViolation, type Viewer } from './station-access.js';
import {
  StationNameTakenError,
  StationsRepository,
  type AuditEntry,
  type NewStation,
  type StationFilter,
  type StationPatch,
  type StationUsage,
  type StationWithOwner,
} from './stations.repository.js';

/** `%text%` for LIKE, with the wildcards of the user's text escaped (`\` is the escape). */
export function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

const withOwner = {
  station: stations,
  ownerName: users.displayName,
};

const flatten = (r: { station: StationRow; ownerName: string | null }): StationWithOwner => ({
  ...r.station,
  ownerName: r.ownerName ?? '',
});

/** Live links and nets that use a station (nets: as control station or as a member). */
function usageIn(db: Pick<Db, 'select'>, stationId: number, notOwnedBy?: number): StationUsage {
  const linkCount =
    db
      .select({ n: count() })
      .from(links)
      .where(
        and(
          isNull(links.deletedAt),
          or(eq(links.fromStationId, stationId), eq(links.toStationId, stationId)),
          notOwnedBy === undefined ? undefined : ne(links.ownerId, notOwnedBy),
        ),
      )
      .get()?.n ?? 0;
  const member = db
    .select({ netId: netMembers.netId })
    .from(netMembers)
    .where(eq(netMembers.stationId, stationId));
  const netCount =
    db
      .select({ n: count() })
      .from(nets)
      .where(
        and(
          isNull(nets.deletedAt),
          or(eq(nets.controlStationId, stationId), inArray(nets.id, member)),
          notOwnedBy === undefined ? undefined : ne(nets.ownerId, notOwnedBy),
        ),
      )
      .get()?.n ?? 0;
  return { links: linkCount, nets: netCount };
}

@Injectable()
export class DrizzleStationsRepository extends StationsRepository {
  constructor(@Inject(DB) private readonly db: Db) {
    super();
  }

  findById(id: number): StationWithOwner | undefined {
    const r = this.db
      .select(withOwner)
      .from(stations)
      .leftJoin(users, eq(users.id, stations.ownerId))
      .where(and(eq(stations.id, id), isNull(stations.deletedAt)))
      .get();
    return r ? flatten(r) : undefined;
  }

  findByIds(ids: number[]): StationWithOwner[] {
    if (ids.length === 0) return [];
    return this.db
      .select(withOwner)
      .from(stations)
      .leftJoin(users, eq(users.id, stations.ownerId))
      .where(and(inArray(stations.id, ids), isNull(stations.deletedAt)))
      .all()
      .map(flatten);
  }

  /** List and count, prepared per shape: mine / sees all / text filter (see db/query-shapes). */
  private readonly listQueries = byShape((shape) => {
    const [mine, seesAll, text] = [...shape].map((c) => c === '1');
    const userId = sql.placeholder('userId');
    const q = sql.placeholder('q');
    const conditions: (SQL | undefined)[] = [isNull(stations.deletedAt)];
    if (mine) conditions.push(eq(stations.ownerId, userId));
    else if (!seesAll) conditions.push(or(eq(stations.ownerId, userId), eq(stations.shared, true)));
    if (text) {
      // SQLite's LIKE ignores ASCII case.
      conditions.push(
        or(
          sql`${stations.name} like ${q} escape '\\'`,
          sql`${stations.callSign} like ${q} escape '\\'`,
        ),
      );
    }
    const where = and(...conditions);
    return {
      rows: this.db
        .select(withOwner)
        .from(stations)
        .leftJoin(users, eq(users.id, stations.ownerId))
        .where(where)
        .orderBy(sql`${stations.name} collate nocase`, asc(stations.id))
        .limit(sql.placeholder('limit'))
        .offset(sql.placeholder('offset'))
        .prepare(),
      total: this.db.select({ n: count() }).from(stations).where(where).prepare(),
    };
  });

  list(viewer: Viewer, filter: StationFilter) {
    const query = this.listQueries(flags(filter.mine, viewer.seesAll, filter.q));
    const values = {
      userId: viewer.userId,
      q: filter.q ? likePattern(filter.q) : '',
      limit: filter.limit,
      offset: filter.offset,
    };
    return {
      rows: query.rows.all(values).map(flatten),
      total: query.total.get(values)?.n ?? 0,
    };
  }

  findByOwnerAndName(ownerId: number, name: string, exceptId?: number): StationRow | undefined {
    return this.db
      .select()
      .from(stations)
      .where(
        and(
          eq(stations.ownerId, ownerId),
          isNull(stations.deletedAt),
          sql`lower(${stations.name}) = lower(${name})`,
          exceptId === undefined ? undefined : ne(stations.id, exceptId),
        ),
      )
      .get();
  }

  usage(stationId: number, notOwnedBy?: number): StationUsage {
    return usageIn(this.db, stationId, notOwnedBy);
  }

  create(station: NewStation, audit: AuditEntry): StationWithOwner {
    try {
      const id = this.db.transaction((tx) => {
        const row = tx.insert(stations).values(station).returning({ id: stations.id }).get();
        tx.insert(auditLog)
          .values({
            actorUserId: audit.actorUserId,
            action: audit.action,
            target: `station:${row.id}`,
            detail: audit.detail ?? null,
          })
          .run();
        return row.id;
      });
      return this.findById(id) as StationWithOwner;
    } catch (err) {
      if (isUniqueViolation(err)) throw new StationNameTakenError(station.name);
      throw err;
    }
  }

  update(id: number, patch: StationPatch, audit: AuditEntry): StationWithOwner | undefined {
    try {
      const updated = this.db.transaction((tx) => {
        const row = tx
          .update(stations)
          .set({ ...patch, updatedAt: new Date().toISOString() })
          .where(and(eq(stations.id, id), isNull(stations.deletedAt)))
          .returning({ id: stations.id })
          .get();
        if (!row) return false;
        tx.insert(auditLog)
          .values({
            actorUserId: audit.actorUserId,
            action: audit.action,
            target: `station:${id}`,
            detail: audit.detail ?? null,
          })
          .run();
        return true;
      });
      return updated ? this.findById(id) : undefined;
    } catch (err) {
      if (isUniqueViolation(err)) throw new StationNameTakenError(patch.name ?? '');
      throw err;
    }
  }

  softDelete(id: number, audit: AuditEntry): boolean {
    return this.db.transaction((tx) => {
      // Re-checked inside the transaction so a link or net created meanwhile is not orphaned.
      const inUse = usageIn(tx, id);
      if (inUse.links + inUse.nets > 0) return false;
      const now = new Date().toISOString();
      const row = tx
        .update(stations)
        .set({ deletedAt: now, updatedAt: now })
        .where(and(eq(stations.id, id), isNull(stations.deletedAt)))
        .returning({ id: stations.id })
        .get();
      if (!row) return false;
      tx.insert(auditLog)
        .values({
          actorUserId: audit.actorUserId,
          action: audit.action,
          target: `station:${id}`,
          detail: audit.detail ?? null,
        })
        .run();
      return true;
    });
  }
}
