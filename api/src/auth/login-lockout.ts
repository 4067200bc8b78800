import { HttpException, Inject, Injectable } from '@nestjs/common';
import { eq, sql } from 'drizzle-orm';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import { users, type UserRow } from '../db/schema.js';
import { errorBody } from '../http/api-error.js';

/**
 * Per-account lock-out against password guessing (on top of the per-IP login throttle):
 * after MAX_FAILED_LOGINS wrong passwords in a row, sign-in is refused for LOCK_MINUTES with
 * 423 Locked (RFC 4918 §11.3; distinct from the per-IP 429) and Retry-After (RFC 9110 §10.2.3). Five tries and 15 minutes are common
 * practice (OWASP Authentication Cheat Sheet suggests a lock-out threshold and duration; the
 * numbers are ours). A success resets the count. Stored on the user row, so restarts keep it.
 */
export const MAX_FAILED_LOGINS = 5;
export const LOCK_MINUTES = 15;
const MS_PER_MINUTE = 60_000;

export const ACCOUNT_LOCKED = 'Too many failed sign-ins for this account; try again later';

/** 423 with the number of seconds to wait (the controller copies it into Retry-After). */
export class AccountLockedException extends HttpException {
  constructor(readonly retryAfterSeconds: number) {
    super(errorBody(423, ACCOUNT_LOCKED), 423);
  }
}

@Injectable()
export class LoginLockout {
  constructor(@Inject(DB) private readonly db: Db) {}

  /** Throws AccountLockedException while the account is locked. */
  assertNotLocked(user: UserRow, now = new Date()): void {
    if (!user.lockedUntil) return;
    const untilMs = Date.parse(user.lockedUntil);
    if (untilMs > now.getTime()) {
      throw new AccountLockedException(Math.ceil((untilMs - now.getTime()) / 1000));
    }
  }

  /** Counts a wrong password; the one that reaches the limit locks the account. */
  recordFailure(user: UserRow, now = new Date()): void {
    // One UPDATE, so concurrent failures cannot lose a count.
    const row = this.db
      .update(users)
      .set({ failedLoginCount: sql`${users.failedLoginCount} + 1` })
      .where(eq(users.id, user.id))
      .returning({ failed: users.failedLoginCount })
      .get();
    if (row && row.failed >= MAX_FAILED_LOGINS) {
      const until = new Date(now.getTime() + LOCK_MINUTES * MS_PER_MINUTE).toISOString();
      this.db
        .update(users)
        .set({ failedLoginCount: 0, lockedUntil: until })
        .where(eq(users.id, user.id))
        .run();
    }
  }

  recordSuccess(user: UserRow): void {
    if (user.failedLoginCount === 0 && !user.lockedUntil) return;
    this.db
      .update(users)
      .set({ failedLoginCount: 0, lockedUntil: null })
      .where(eq(users.id, user.id))
      .run();
  }
}
