import type { UserView } from '@hopwise/common';
import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { UserRow } from '../db/schema.js';

/** The signed-in user attached to the request by the JWT strategy. */
export type AuthUser = UserView;

export function toUserView(row: UserRow): UserView {
  return {
    id: row.id,
    email: row.email,
    displayName: row.displayName,
    role: row.role,
    disabled: row.disabled,
    createdAt: row.createdAt,
  };
}

export const CurrentUser = createParamDecorator(
  (_data: unknown, ctx: ExecutionContext): AuthUser =>
    ctx.switchToHttp().getRequest<{ user: AuthUser }>().user,
);
