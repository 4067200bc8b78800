import type { ListResponse, UserView } from '@hopwise/common';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { toUserView, type AuthUser } from '../auth/auth-user.js';
import { hashPassword } from '../auth/password.js';
import { passwordProblem } from '../auth/password-policy.js';
import { ApiException, badRequest } from '../http/api-error.js';
import type { CreateUserDto } from './dto/create-user.dto.js';
import type { UpdateUserDto } from './dto/update-user.dto.js';
import { EmailTakenError, UsersRepository, type UserPatch } from './users.repository.js';

const DEFAULT_PAGE = 50;

/** The part of an address before `@`, as a display name when none is given. */
function nameFromEmail(email: string): string {
  return email.split('@')[0].slice(0, 80) || email;
}

@Injectable()
export class UsersService {
  constructor(private readonly repo: UsersRepository) {}

  async list(limit = DEFAULT_PAGE, offset = 0): Promise<ListResponse<UserView>> {
    const { rows, total } = await this.repo.list({ limit, offset });
    return { items: rows.map(toUserView), total };
  }

  async create(actor: AuthUser, dto: CreateUserDto): Promise<UserView> {
    const email = dto.email.toLowerCase();
    const displayName = dto.displayName || nameFromEmail(email);
    const problem = passwordProblem(dto.password, email);
    if (problem) throw badRequest(`password ${problem}`, { password: `password ${problem}` });
    try {
      const row = await this.repo.create(
        { email, displayName, role: dto.role, passwordHash: await hashPassword(dto.password) },
        {
          actorUserId: actor.id,
          action: 'user.create',
          detail: { email, role: dto.role, displayName },
        },
      );
      return toUserView(row);
    } catch (err) {
      if (err instanceof EmailTakenError) {
        throw new ApiException(409, 'A user with this e-mail already exists', {
          email: 'already in use',
        });
      }
      throw err;
    }
  }

  async update(actor: AuthUser, id: number, dto: UpdateUserDto): Promise<UserView> {
    const current = await this.repo.findById(id);
    if (!current) throw new NotFoundException(`User ${id} not found`);

    // An admin cannot lock themselves out: that could leave the site without any admin.
    if (id === actor.id && dto.disabled === true) {
      throw new ConflictException('You cannot disable your own account');
    }
    if (id === actor.id && dto.role !== undefined && dto.role !== current.role) {
      throw new ConflictException('You cannot change your own role');
    }

    const patch: UserPatch = {};
    const changes: Record<string, { from: unknown; to: unknown }> = {};
    for (const key of ['role', 'disabled', 'displayName'] as const) {
      const to = dto[key];
      if (to !== undefined && to !== current[key]) {
        Object.assign(patch, { [key]: to });
        changes[key] = { from: current[key], to };
      }
    }
    if (Object.keys(patch).length === 0) return toUserView(current);

    const row = await this.repo.update(id, patch, {
      actorUserId: actor.id,
      action: 'user.update',
      detail: { changes },
    });
    if (!row) throw new NotFoundException(`User ${id} not found`);
    return toUserView(row);
  }
}
