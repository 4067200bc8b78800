import { Inject, Injectable } from '@nestjs/common';
import { and, asc, count, desc, eq, inArray, isNull, max, or, sql } from 'drizzle-orm';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import { auditLog } from '../db/schema.js';
import { stations } from '../db/schema/links.js';
import {
  netMembers,
  nets,
  scheduleOverrides,
  schedules,
  type NetRow,
  type ScheduleOverrideRow,
  type ScheduleRow,
} from '../db/schema/nets.js';

export type NetWithMembers = NetRow & { memberStationIds: number[] };
export type NewSchedule = Omit<typeof schedules.$inferInsert, 'version' | 'id'>;

export interface Audit {
  actorUserId: number | null;
  action: string;
  detail?: Record<string, unknown>;
}

/** Who lists nets: an admin sees all; others their own and those they belong to. */
export interface NetViewer {
  userId: number;
  seesAll: boolean;
}

/** Storage of nets, members, overrides and published schedules (each write one transaction). */
@Injectable()
export class NetsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  private audit(target: string, a: Audit) {
    this.db
      .insert(auditLog)
      .values({ actorUserId: a.actorUserId, action: a.action, target, detail: a.detail ?? null })
      .run();
  }

  private membersOf(netIds: number[]): Map<number, number[]> {
    const map = new Map<number, number[]>(netIds.map((id) => [id, []]));
    if (!netIds.length) return map;
    const rows = this.db
      .select()
      .from(netMembers)
      .where(inArray(netMembers.netId, netIds))
      .orderBy(asc(netMembers.id))
      .all();
    for (const r of rows) map.get(r.netId)?.push(r.stationId);
    return map;
  }

  findById(id: number): NetWithMembers | undefined {
    const row = this.db
      .select()
      .from(nets)
      .where(and(eq(nets.id, id), isNull(nets.deletedAt)))
      .get();
    return row ? { ...row, memberStationIds: this.membersOf([id]).get(id) ?? [] } : undefined;
  }

  /** Nets owned by the viewer or with a control/member station the viewer owns (all for admin). */
  list(viewer: NetViewer, page: { limit: number; offset: number }) {
    const stationOwned = sql`exists (select 1 from ${stations} s where s.owner_id = ${viewer.userId} and (s.id = ${nets.controlStationId} or s.id in (select m.station_id from ${netMembers} m where m.net_id = ${nets.id})))`;
    const where = viewer.seesAll
      ? isNull(nets.deletedAt)
      : and(isNull(nets.deletedAt), or(eq(nets.ownerId, viewer.userId), stationOwned));
    const rows = this.db
      .select()
      .from(nets)
      .where(where)
      .orderBy(asc(nets.name), asc(nets.id))
      .limit(page.limit)
      .offset(page.offset)
      .all();
    const total = this.db.select({ n: count() }).from(nets).where(where).get()?.n ?? 0;
    const members = this.membersOf(rows.map((r) => r.id));
    return { rows: rows.map((r) => ({ ...r, memberStationIds: members.get(r.id) ?? [] })), total };
  }

  /** All live nets (for the watch). */
  all(): NetWithMembers[] {
    const rows = this.db.select().from(nets).where(isNull(nets.deletedAt)).all();
    const members = this.membersOf(rows.map((r) => r.id));
    return rows.map((r) => ({ ...r, memberStationIds: members.get(r.id) ?? [] }));
  }

  create(
    net: { ownerId: number; name: string; controlStationId: number; channelsKHz: number[] },
    memberStationIds: number[],
    audit: Audit,
  ): NetWithMembers {
    return this.db.transaction(() => {
      const row = this.db.insert(nets).values(net).returning().get();
      for (const stationId of memberStationIds) {
        this.db.insert(netMembers).values({ netId: row.id, stationId }).run();
      }
      this.audit(`net:${row.id}`, audit);
      return { ...row, memberStationIds };
    });
  }

  update(
    id: number,
    patch: Partial<Pick<NetRow, 'name' | 'controlStationId' | 'channelsKHz'>>,
    memberStationIds: number[] | undefined,
    audit: Audit,
  ): NetWithMembers | undefined {
    return this.db.transaction(() => {
      this.db
        .update(nets)
        .set({ ...patch, updatedAt: new Date().toISOString() })
        .where(and(eq(nets.id, id), isNull(nets.deletedAt)))
        .run();
      if (memberStationIds) {
        this.db.delete(netMembers).where(eq(netMembers.netId, id)).run();
        for (const stationId of memberStationIds) {
          this.db.insert(netMembers).values({ netId: id, stationId }).run();
        }
      }
      this.audit(`net:${id}`, audit);
      return this.findById(id);
    });
  }

  softDelete(id: number, audit: Audit): void {
    this.db.transaction(() => {
      this.db
        .update(nets)
        .set({ deletedAt: new Date().toISOString(), updatedAt: new Date().toISOString() })
        .where(eq(nets.id, id))
        .run();
      this.audit(`net:${id}`, audit);
    });
  }

  overrides(netId: number, fromUtc: string, toUtc: string): ScheduleOverrideRow[] {
    return this.db
      .select()
      .from(scheduleOverrides)
      .where(
        and(
          eq(scheduleOverrides.netId, netId),
          sql`${scheduleOverrides.startUtc} >= ${fromUtc} and ${scheduleOverrides.startUtc} < ${toUtc}`,
        ),
      )
      .all();
  }

  /** Sets (channel) or clears (null) overrides, all in one transaction. */
  setOverrides(
    netId: number,
    ownerId: number,
    slots: { startUtc: string; channelKHz: number | null }[],
    audit: Audit,
  ): void {
    this.db.transaction(() => {
      for (const s of slots) {
        this.db
          .delete(scheduleOverrides)
          .where(
            and(eq(scheduleOverrides.netId, netId), eq(scheduleOverrides.startUtc, s.startUtc)),
          )
          .run();
        if (s.channelKHz !== null) {
          this.db
            .insert(scheduleOverrides)
            .values({ netId, ownerId, startUtc: s.startUtc, channelKHz: s.channelKHz })
            .run();
        }
      }
      this.audit(`net:${netId}`, audit);
    });
  }

  /** A new immutable version (previous max + 1) and its audit row, in one transaction. */
  publish(row: NewSchedule, audit: Audit): ScheduleRow {
    return this.db.transaction(() => {
      const last =
        this.db
          .select({ v: max(schedules.version) })
          .from(schedules)
          .where(eq(schedules.netId, row.netId))
          .get()?.v ?? 0;
      const created = this.db
        .insert(schedules)
        .values({ ...row, version: last + 1 })
        .returning()
        .get();
      this.audit(`net:${row.netId}`, {
        ...audit,
        detail: { ...audit.detail, version: created.version },
      });
      return created;
    });
  }

  schedule(netId: number, version?: number): ScheduleRow | undefined {
    const q = this.db.select().from(schedules);
    return version === undefined
      ? q.where(eq(schedules.netId, netId)).orderBy(desc(schedules.version)).limit(1).get()
      : q.where(and(eq(schedules.netId, netId), eq(schedules.version, version))).get();
  }
}
