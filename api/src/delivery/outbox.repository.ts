import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq, lte, or, sql } from 'drizzle-orm';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import {
  notices,
  outbox,
  pushSubscriptions,
  type NoticeRow,
  type OutboxRow,
  type PushSubscriptionRow,
} from '../db/schema.js';

/** A claimed outbox row with what is needed to send it. */
export interface ClaimedDelivery {
  row: OutboxRow;
  notice: NoticeRow;
}

@Injectable()
export class OutboxRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  private dueWhere(nowIso: string) {
    return or(
      and(eq(outbox.status, 'pending'), lte(outbox.nextAttemptAt, nowIso)),
      // A worker that crashed mid-send left the row 'sending': claimable again once its lease ends.
      and(eq(outbox.status, 'sending'), lte(outbox.claimedUntil, nowIso)),
    );
  }

  dueIds(now: Date, limit: number): number[] {
    return this.db
      .select({ id: outbox.id })
      .from(outbox)
      .where(this.dueWhere(now.toISOString()))
      .orderBy(asc(outbox.nextAttemptAt), asc(outbox.id))
      .limit(limit)
      .all()
      .map((r) => r.id);
  }

  /**
   * Claims one row atomically: a single UPDATE that only matches while the row is still due, so
   * two workers (or two ticks) can never both claim it. Counts the attempt.
   */
  claim(id: number, now: Date, leaseMs: number): ClaimedDelivery | undefined {
    const nowIso = now.toISOString();
    const row = this.db
      .update(outbox)
      .set({
        status: 'sending',
        claimedUntil: new Date(now.getTime() + leaseMs).toISOString(),
        attempts: sql`${outbox.attempts} + 1`,
        updatedAt: nowIso,
      })
      .where(and(eq(outbox.id, id), this.dueWhere(nowIso)))
      .returning()
      .get();
    if (!row) return undefined;
    const notice = this.db.select().from(notices).where(eq(notices.id, row.noticeId)).get();
    return notice ? { row, notice } : undefined;
  }

  /** Only after the service acknowledged. Guarded by the claim (status 'sending'). */
  markSent(id: number, at: Date): void {
    this.db
      .update(outbox)
      .set({
        status: 'sent',
        sentAt: at.toISOString(),
        claimedUntil: null,
        lastError: null,
        updatedAt: at.toISOString(),
      })
      .where(and(eq(outbox.id, id), eq(outbox.status, 'sending')))
      .run();
  }

  markRetry(id: number, nextAttemptAt: Date, error: string): void {
    this.db
      .update(outbox)
      .set({
        status: 'pending',
        nextAttemptAt: nextAttemptAt.toISOString(),
        claimedUntil: null,
        lastError: error.slice(0, 500),
        updatedAt: new Date().toISOString(),
      })
      .where(and(eq(outbox.id, id), eq(outbox.status, 'sending')))
      .run();
  }

  markFailed(id: number, error: string): void {
    this.db
      .update(outbox)
      .set({
        status: 'failed',
        claimedUntil: null,
        lastError: error.slice(0, 500),
        updatedAt: new Date().toISOString(),
      })
      .where(and(eq(outbox.id, id), eq(outbox.status, 'sending')))
      .run();
  }

  pushSubscription(id: number): PushSubscriptionRow | undefined {
    return this.db.select().from(pushSubscriptions).where(eq(pushSubscriptions.id, id)).get();
  }

  /** The push service said the subscription no longer exists (404/410). */
  disablePushSubscription(id: number, at: Date): void {
    this.db
      .update(pushSubscriptions)
      .set({ disabledAt: at.toISOString(), updatedAt: at.toISOString() })
      .where(eq(pushSubscriptions.id, id))
      .run();
  }

  all(): OutboxRow[] {
    return this.db.select().from(outbox).orderBy(asc(outbox.id)).all();
  }
}
