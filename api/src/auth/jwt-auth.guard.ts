import { Injectable, UnauthorizedException, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { IS_PUBLIC } from '../http/public.decorator.js';
import { INVALID_TOKEN } from './jwt.strategy.js';

/** Global guard: every route needs a valid bearer token unless marked `@Public()`. */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override canActivate(context: ExecutionContext) {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (isPublic) return true;
    return super.canActivate(context);
  }

  override handleRequest<T>(err: unknown, user: T | false): T {
    if (err)
      throw err instanceof UnauthorizedException ? err : new UnauthorizedException(INVALID_TOKEN);
    if (!user) throw new UnauthorizedException(INVALID_TOKEN);
    return user;
  }
}
