import { createSecretKey } from 'node:crypto';
import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { UsersRepository } from '../users/users.repository.js';
import { ACCOUNT_DISABLED, type AccessTokenClaims } from './auth.service.js';
import { toUserView, type AuthUser } from './auth-user.js';

export const INVALID_TOKEN = 'Missing or invalid access token';

/**
 * Verifies the bearer token, then re-reads the user on every request so that disabling an
 * account (or changing its role) takes effect at once, not when the token expires.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(
    @Inject(APP_CONFIG) config: AppConfig,
    private readonly users: UsersRepository,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // A KeyObject, not the string: jsonwebtoken otherwise tries createPublicKey() on the
      // string on every request (it throws and falls back), which was the largest single cost
      // of an authenticated request under load. jsonwebtoken 9 accepts a KeyObject; the
      // passport-jwt typings only list string | Buffer.
      secretOrKey: createSecretKey(Buffer.from(config.jwtSecret, 'utf8')) as unknown as Buffer,
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  async validate(claims: AccessTokenClaims): Promise<AuthUser> {
    const id = Number(claims.sub);
    const user = Number.isSafeInteger(id) ? await this.users.findById(id) : undefined;
    if (!user) throw new UnauthorizedException(INVALID_TOKEN);
    if (user.disabled) throw new UnauthorizedException(ACCOUNT_DISABLED);
    return toUserView(user);
  }
}
