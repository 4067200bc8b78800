import { ROLES } from '@hopwise/common';
import { sql } from 'drizzle-orm';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';

// Timestamps are ISO 8601 UTC strings (`2025-01-31T12:00:00.000Z`): they sort as text and read
// the same in the API and in the database.
const nowIso = sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`;

export const users = sqliteTable('users', {
  id: integer('id').primaryKey({ autoIncrement: true }),
  /** Stored lower-cased; unique. */
  email: text('email').notNull().unique(),
  displayName: text('display_name').notNull(),
  role: text('role', { enum: ROLES }).notNull(),
  /** `scrypt$N$r$p$salt$hash` (api/src/auth/password.ts). */
  passwordHash: text('password_hash').notNull(),
  disabled: integer('disabled', { mode: 'boolean' }).notNull().default(false),
  /** Failed sign-ins since the last success or lock (api/src/auth/login-lockout.ts). */
  failedLoginCount: integer('failed_login_count').notNull().default(0),
  /** ISO 8601 UTC; sign-in refused until then after too many failures. */
  lockedUntil: text('locked_until'),
  createdAt: text('created_at').notNull().default(nowIso),
  updatedAt: text('updated_at').notNull().default(nowIso),
});

export const auditLog = sqliteTable(
  'audit_log',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    at: text('at').notNull().default(nowIso),
    /** Null for changes made by the system (e.g. the demo seed). */
    actorUserId: integer('actor_user_id').references(() => users.id),
    /** Dotted verb, e.g. `user.create`, `user.update`. */
    action: text('action').notNull(),
    /** What was changed, e.g. `user:12`. */
    target: text('target').notNull(),
    detail: text('detail', { mode: 'json' }).$type<Record<string, unknown>>(),
  },
  (t) => [index('audit_log_at_idx').on(t.at), index('audit_log_target_idx').on(t.target)],
);

export type UserRow = typeof users.$inferSelect;
export type NewUserRow = typeof users.$inferInsert;
export type AuditRow = typeof auditLog.$inferSelect;
export * from './schema/profiles.js';
export * from './schema/links.js';
export * from './schema/notices.js';
export * from './schema/nets.js';
export * from './schema/conditions.js';
