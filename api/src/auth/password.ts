import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from 'node:crypto';

/**
 * Password hashing with scrypt (RFC 7914) from Node's crypto. Stored as
 * `scrypt$N$r$p$saltBase64$hashBase64` so the cost can be raised later without breaking old hashes.
 * N = 2^15, r = 8, p = 1 (≈ 32 MiB, tens of ms on this machine): above Node's default 2^14; OWASP's
 * password-storage cheat sheet suggests N = 2^17 where memory allows (common practice).
 */
const COST = { N: 2 ** 15, r: 8, p: 1 };
const KEY_BYTES = 64;
const SALT_BYTES = 16;

export const MIN_PASSWORD_LENGTH = 10;

function derive(password: string, salt: Buffer, opts: ScryptOptions & { N: number; r: number }) {
  // scrypt needs 128·N·r bytes; Node's default maxmem (32 MiB) is exactly at the limit for 2^15.
  const maxmem = 256 * opts.N * opts.r;
  return new Promise<Buffer>((resolve, reject) =>
    scrypt(password, salt, KEY_BYTES, { ...opts, maxmem }, (err, key) =>
      err ? reject(err) : resolve(key),
    ),
  );
}

export async function hashPassword(password: string): Promise<string> {
  const salt = randomBytes(SALT_BYTES);
  const key = await derive(password, salt, COST);
  return ['scrypt', COST.N, COST.r, COST.p, salt.toString('base64'), key.toString('base64')].join(
    '$',
  );
}

/** Constant-time check; false (never a throw) for a malformed stored value. */
export async function verifyPassword(password: string, stored: string): Promise<boolean> {
  const parts = stored.split('$');
  if (parts.length !== 6 || parts[0] !== 'scrypt') return false;
  const [N, r, p] = parts.slice(1, 4).map(Number);
  if (![N, r, p].every((v) => Number.isSafeInteger(v) && v > 0)) return false;
  const salt = Buffer.from(parts[4], 'base64');
  const expected = Buffer.from(parts[5], 'base64');
  if (expected.length !== KEY_BYTES) return false;
  const actual = await derive(password, salt, { N, r, p });
  return timingSafeEqual(actual, expected);
}

/** A hash of a random password, verified against when the e-mail is unknown (equal timing). */
let decoy: Promise<string> | undefined;
export function decoyHash(): Promise<string> {
  decoy ??= hashPassword(randomBytes(16).toString('hex'));
  return decoy;
}
