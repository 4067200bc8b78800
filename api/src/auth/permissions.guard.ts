import { hasPermission, type Permission } from '@hopwise/common';
import {
  ForbiddenException,
  Injectable,
  type CanActivate,
  type ExecutionContext,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { REQUIRED_PERMISSIONS } from '../http/require-permission.decorator.js';
import type { AuthUser } from './auth-user.js';

/** Global guard after JwtAuthGuard: checks `@RequirePermission(...)` against the one table. */
@Injectable()
export class PermissionsGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const required = this.reflector.getAllAndMerge<Permission[]>(REQUIRED_PERMISSIONS, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!required || required.length === 0) return true;
    const user = context.switchToHttp().getRequest<{ user?: AuthUser }>().user;
    const missing = user ? required.filter((p) => !hasPermission(user.role, p)) : required;
    if (missing.length > 0) {
      throw new ForbiddenException(`Your role does not allow this (needs ${missing.join(', ')})`);
    }
    return true;
  }
}
