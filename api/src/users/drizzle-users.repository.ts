import { Inject, Injectable } from '@nestjs/common';
import { asc, count, eq, sql } from 'drizzle-orm';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import { auditLog, users, type UserRow } from '../db/schema.js';
import {
  EmailTakenError,
  UsersRepository,
  type AuditEntry,
  type NewUser,
  type UserPatch,
} from './users.repository.js';

function isUniqueViolation(err: unknown): boolean {
  return (err as { code?: string })?.code === 'SQLITE_CONSTRAINT_UNIQUE';
}

@Injectable()
export class DrizzleUsersRepository extends UsersRepository {
  /** Read on every authenticated request (JwtStrategy): prepared once, not rebuilt per call. */
  private readonly byId;

  constructor(@Inject(DB) private readonly db: Db) {
    super();
    this.byId = db
      .select()
      .from(users)
      .where(eq(users.id, sql.placeholder('id')))
      .prepare();
  }

  async findById(id: number): Promise<UserRow | undefined> {
    return this.byId.get({ id });
  }

  async findByEmail(email: string): Promise<UserRow | undefined> {
    return this.db.select().from(users).where(eq(users.email, email.toLowerCase())).get();
  }

  async count(): Promise<number> {
    return this.db.select({ n: count() }).from(users).get()?.n ?? 0;
  }

  async list(page: { limit: number; offset: number }) {
    const rows = this.db
      .select()
      .from(users)
      .orderBy(asc(users.id))
      .limit(page.limit)
      .offset(page.offset)
      .all();
    return { rows, total: await this.count() };
  }

  async create(user: NewUser, audit: AuditEntry): Promise<UserRow> {
    const email = user.email.toLowerCase();
    try {
      // better-sqlite3 transactions are synchronous: the insert and its audit row commit together.
      return this.db.transaction((tx) => {
        const row = tx
          .insert(users)
          .values({ ...user, email })
          .returning()
          .get();
        tx.insert(auditLog)
          .values({
            actorUserId: audit.actorUserId,
            action: audit.action,
            target: `user:${row.id}`,
            detail: audit.detail ?? null,
          })
          .run();
        return row;
      });
    } catch (err) {
      if (isUniqueViolation(err)) throw new EmailTakenError(email);
      throw err;
    }
  }

  async update(id: number, patch: UserPatch, audit: AuditEntry): Promise<UserRow | undefined> {
    return this.db.transaction((tx) => {
      const row = tx
        .update(users)
        .set({ ...patch, updatedAt: new Date().toISOString() })
        .where(eq(users.id, id))
        .returning()
        .get();
      if (!row) return undefined;
      tx.insert(auditLog)
        .values({
          actorUserId: audit.actorUserId,
          action: audit.action,
          target: `user:${id}`,
          detail: audit.detail ?? null,
        })
        .run();
      return row;
    });
  }
}
