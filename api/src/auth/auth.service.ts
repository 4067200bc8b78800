import type { LoginResponse } from '@hopwise/common';
import { Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { UserRow } from '../db/schema.js';
import { UsersRepository } from '../users/users.repository.js';
import { LoginLockout } from './login-lockout.js';
import { decoyHash, verifyPassword } from './password.js';

export const BAD_CREDENTIALS = 'Invalid email or password';
export const ACCOUNT_DISABLED = 'Account disabled';

/** Claims of our access tokens; `sub` is the user id as a string (RFC 7519 §4.1.2). */
export interface AccessTokenClaims {
  sub: string;
  role: string;
}

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersRepository,
    private readonly jwt: JwtService,
    private readonly lockout: LoginLockout,
  ) {}

  async login(email: string, password: string): Promise<LoginResponse> {
    const user = await this.users.findByEmail(email.toLowerCase());
    // A locked account is refused before the password is checked, so guessing stops counting.
    if (user) this.lockout.assertNotLocked(user);
    // Unknown e-mail: still run one scrypt so the timing does not reveal which addresses exist.
    const ok = await verifyPassword(password, user?.passwordHash ?? (await decoyHash()));
    if (user && !ok) this.lockout.recordFailure(user);
    if (!user || !ok) throw new UnauthorizedException(BAD_CREDENTIALS);
    // Only someone who knows the password learns that the account is disabled.
    if (user.disabled) throw new UnauthorizedException(ACCOUNT_DISABLED);
    this.lockout.recordSuccess(user);
    return this.issue(user);
  }

  /** A fresh token for a signed-in user (whose account the JWT strategy has just re-read). */
  async refresh(userId: number): Promise<LoginResponse> {
    const user = await this.users.findById(userId);
    if (!user || user.disabled) throw new UnauthorizedException(ACCOUNT_DISABLED);
    return this.issue(user);
  }

  private async issue(user: UserRow): Promise<LoginResponse> {
    const claims: AccessTokenClaims = { sub: String(user.id), role: user.role };
    return {
      accessToken: await this.jwt.signAsync(claims),
      user: { id: user.id, email: user.email, role: user.role, displayName: user.displayName },
    };
  }
}
