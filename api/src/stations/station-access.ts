import type { UserView } from '@hopwise/common';
import { Param, ParseIntPipe } from '@nestjs/common';
import { ApiException, badRequest } from '../http/api-error.js';

/** Admins see and change every row (SPEC §1). */
export const isAdmin = (user: UserView): boolean => user.role === 'admin';

/** Who is asking, as the repositories need it. */
export interface Viewer {
  userId: number;
  seesAll: boolean;
}

export const viewerOf = (user: UserView): Viewer => ({ userId: user.id, seesAll: isAdmin(user) });

/** `:id` as a positive integer, else 400 naming `id`. */
export function IdParam(): ParameterDecorator {
  return Param(
    'id',
    new ParseIntPipe({
      exceptionFactory: () => badRequest('id must be an integer', { id: 'must be an integer' }),
    }),
  );
}

export const notFound = (kind: string, id: number) =>
  new ApiException(404, `${kind} ${id} not found`);

/**
 * Rule for PATCH/DELETE: owner or admin. A row the user can see but does not own (another user's
 * shared station) answers 403; a row the user cannot see at all answers 404 before this is asked.
 */
export function assertCanChange(row: { ownerId: number }, user: UserView, kind: string): void {
  if (row.ownerId !== user.id && !isAdmin(user)) {
    throw new ApiException(403, `Only the owner or an admin can change this ${kind}`);
  }
}

/** Unique-constraint failures of better-sqlite3. */
export function isUniqueViolation(err: unknown): boolean {
  return (err as { code?: string })?.code === 'SQLITE_CONSTRAINT_UNIQUE';
}
