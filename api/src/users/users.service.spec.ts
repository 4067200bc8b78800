import { ConflictException, NotFoundException } from '@nestjs/common';
import { beforeEach, describe, expect, it } from 'vitest';
import type { UserRow } from '../db/schema.js';
import { ApiException } from '../http/api-error.js';
import {
  EmailTakenError,
  UsersRepository,
  type AuditEntry,
  type NewUser,
  type UserPatch,
} from './users.repository.js';
import { UsersService } from './users.service.js';

/** In-memory stand-in for the Drizzle repository, recording audit entries. */
class FakeUsersRepository extends UsersRepository {
  rows: UserRow[] = [];
  audit: (AuditEntry & { target: string })[] = [];

  async findById(id: number) {
    return this.rows.find((r) => r.id === id);
  }
  async findByEmail(email: string) {
    return this.rows.find((r) => r.email === email);
  }
  async count() {
    return this.rows.length;
  }
  async list(page: { limit: number; offset: number }) {
    return {
      rows: this.rows.slice(page.offset, page.offset + page.limit),
      total: this.rows.length,
    };
  }
  async create(user: NewUser, audit: AuditEntry) {
    if (this.rows.some((r) => r.email === user.email)) throw new EmailTakenError(user.email);
    const now = new Date().toISOString();
    const row: UserRow = {
      id: this.rows.length + 1,
      disabled: false,
      failedLoginCount: 0,
      lockedUntil: null,
      createdAt: now,
      updatedAt: now,
      ...user,
    };
    this.rows.push(row);
    this.audit.push({ ...audit, target: `user:${row.id}` });
    return row;
  }
  async update(id: number, patch: UserPatch, audit: AuditEntry) {
    const row = this.rows.find((r) => r.id === id);
    if (!row) return undefined;
    Object.assign(row, patch);
    this.audit.push({ ...audit, target: `user:${id}` });
    return row;
  }
}

describe('UsersService', () => {
  let repo: FakeUsersRepository;
  let service: UsersService;
  const admin = {
    id: 1,
    email: 'admin@example.org',
    displayName: 'Admin',
    role: 'admin' as const,
    disabled: false,
    createdAt: '2025-01-01T00:00:00.000Z',
  };

  beforeEach(async () => {
    repo = new FakeUsersRepository();
    service = new UsersService(repo);
    await repo.create(
      { email: admin.email, displayName: 'Admin', role: 'admin', passwordHash: 'x' },
      { actorUserId: null, action: 'seed' },
    );
    repo.audit = [];
  });

  it('lower-cases the e-mail, hashes the password, derives a display name', async () => {
    const view = await service.create(admin, {
      email: 'Radio.Room@Example.org',
      password: 'long-enough-pw',
      role: 'operator',
    });
    expect(view).toMatchObject({ email: 'radio.room@example.org', displayName: 'radio.room' });
    expect(repo.rows[1].passwordHash).toMatch(/^scrypt\$/);
    expect(repo.audit).toEqual([
      expect.objectContaining({ actorUserId: 1, action: 'user.create', target: 'user:2' }),
    ]);
  });

  it('maps a taken e-mail to 409 naming email', async () => {
    const p = service.create(admin, {
      email: 'ADMIN@example.org',
      password: 'long-enough-pw',
      role: 'operator',
    });
    await expect(p).rejects.toBeInstanceOf(ApiException);
    await expect(p).rejects.toMatchObject({ status: 409 });
  });

  it('records only real changes, and skips the write when nothing changes', async () => {
    const u = await service.create(admin, {
      email: 'a@example.org',
      password: 'long-enough-pw',
      role: 'operator',
    });
    repo.audit = [];
    await service.update(admin, u.id, { role: 'operator', displayName: 'A' });
    expect(repo.audit).toEqual([
      expect.objectContaining({ detail: { changes: { displayName: { from: 'a', to: 'A' } } } }),
    ]);
    await service.update(admin, u.id, { role: 'operator' });
    expect(repo.audit).toHaveLength(1);
  });

  it('refuses self-disable and self-demotion, 404s unknown ids', async () => {
    await expect(service.update(admin, 1, { disabled: true })).rejects.toBeInstanceOf(
      ConflictException,
    );
    await expect(service.update(admin, 1, { role: 'analyst' })).rejects.toBeInstanceOf(
      ConflictException,
    );
    await expect(
      service.update(admin, 1, { role: 'admin', displayName: 'Boss' }),
    ).resolves.toMatchObject({
      displayName: 'Boss',
    });
    await expect(service.update(admin, 42, { role: 'analyst' })).rejects.toBeInstanceOf(
      NotFoundException,
    );
  });
});
