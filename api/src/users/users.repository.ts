import type { Role } from '@hopwise/common';
import type { UserRow } from '../db/schema.js';

/** Who made a change and why, written to audit_log in the same transaction as the change. */
export interface AuditEntry {
  actorUserId: number | null;
  action: string;
  detail?: Record<string, unknown>;
}

export interface NewUser {
  email: string;
  displayName: string;
  role: Role;
  passwordHash: string;
}

export interface UserPatch {
  displayName?: string;
  role?: Role;
  disabled?: boolean;
}

/** Storage of users; bound to DrizzleUsersRepository in UsersModule. */
export abstract class UsersRepository {
  abstract findById(id: number): Promise<UserRow | undefined>;
  abstract findByEmail(email: string): Promise<UserRow | undefined>;
  abstract count(): Promise<number>;
  abstract list(page: {
    limit: number;
    offset: number;
  }): Promise<{ rows: UserRow[]; total: number }>;
  /** Throws EmailTakenError when the (lower-cased) e-mail exists. */
  abstract create(user: NewUser, audit: AuditEntry): Promise<UserRow>;
  abstract update(id: number, patch: UserPatch, audit: AuditEntry): Promise<UserRow | undefined>;
}

export class EmailTakenError extends Error {
  constructor(readonly email: string) {
    super(`A user with the e-mail ${email} already exists`);
    this.name = 'EmailTakenError';
  }
}
