import type { Permission } from '@hopwise/common';
import { SetMetadata } from '@nestjs/common';

export const REQUIRED_PERMISSIONS = 'hopwise:requiredPermissions';

/** The signed-in user's role must grant every listed permission (common/src/auth/permissions.ts). */
export const RequirePermission = (...permissions: Permission[]) =>
  SetMetadata(REQUIRED_PERMISSIONS, permissions);
