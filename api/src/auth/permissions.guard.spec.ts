import type { ExecutionContext } from '@nestjs/common';
import { ForbiddenException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { describe, expect, it } from 'vitest';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { PermissionsGuard } from './permissions.guard.js';

class Routes {
  @RequirePermission('users:manage')
  manage() {}
  open() {}
}

function ctx(handler: () => void, role?: string): ExecutionContext {
  return {
    getHandler: () => handler,
    getClass: () => Routes,
    switchToHttp: () => ({ getRequest: () => ({ user: role ? { role } : undefined }) }),
  } as unknown as ExecutionContext;
}

describe('PermissionsGuard (roles from the one table in common)', () => {
  const guard = new PermissionsGuard(new Reflector());

  it('lets a role with the permission through and stops the others with 403', () => {
    expect(guard.canActivate(ctx(Routes.prototype.manage, 'admin'))).toBe(true);
    for (const role of ['operator', 'netcontrol', 'analyst']) {
      expect(() => guard.canActivate(ctx(Routes.prototype.manage, role))).toThrow(
        ForbiddenException,
      );
    }
  });

  it('does nothing on routes without @RequirePermission', () => {
    expect(guard.canActivate(ctx(Routes.prototype.open, 'operator'))).toBe(true);
  });
});
