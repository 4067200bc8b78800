/**
 * First admin on a database started with HOPWISE_DEMO=0 (or another admin later), from the
 * server's shell: `npm run create-admin -- --email you@example.org [--name "Your Name"]`.
 * The password is read from HOPWISE_ADMIN_PASSWORD or, if unset, from the first line of stdin
 * (so it stays out of the shell history: `read -rs P; printf '%s\n' "$P" | npm run create-admin …`).
 * Same rules as the Users page: the password policy, a unique e-mail, an audit row
 * (`user.create`, actor none, `via: cli`) in the same transaction as the user.
 */
import { isEmail } from 'class-validator';
import { hashPassword } from '../auth/password.js';
import { passwordProblem } from '../auth/password-policy.js';
import { openDatabase } from '../db/open-database.js';
import { DrizzleUsersRepository } from '../users/drizzle-users.repository.js';
import { EmailTakenError } from '../users/users.repository.js';

export class CreateAdminError extends Error {}

export interface CreateAdminInput {
  dbFile: string;
  email: string;
  password: string;
  displayName?: string;
}

/** Creates an enabled admin; throws CreateAdminError naming the field for bad input. */
export async function createAdmin(input: CreateAdminInput): Promise<{ id: number; email: string }> {
  const email = input.email.trim().toLowerCase();
  if (!isEmail(email))
    throw new CreateAdminError(`email: "${input.email}" is not an e-mail address`);
  const problem = passwordProblem(input.password, email);
  if (problem) throw new CreateAdminError(`password ${problem}`);
  const displayName = (input.displayName?.trim() || email.split('@')[0]).slice(0, 80);
  const db = openDatabase(input.dbFile);
  try {
    const row = await new DrizzleUsersRepository(db).create(
      { email, displayName, role: 'admin', passwordHash: await hashPassword(input.password) },
      { actorUserId: null, action: 'user.create', detail: { email, role: 'admin', via: 'cli' } },
    );
    return { id: row.id, email: row.email };
  } catch (err) {
    if (err instanceof EmailTakenError) {
      throw new CreateAdminError(`email: a user with ${email} already exists`);
    }
    throw err;
  } finally {
    db.$client.close();
  }
}
