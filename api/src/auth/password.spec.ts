import { describe, expect, it } from 'vitest';
import { hashPassword, verifyPassword } from './password.js';

describe('scrypt password hashes', () => {
  it('stores scrypt$N$r$p$salt$hash and verifies the right password only', async () => {
    const stored = await hashPassword('correct horse battery');
    expect(stored).toMatch(/^scrypt\$32768\$8\$1\$[A-Za-z0-9+/]{22}==\$[A-Za-z0-9+/]{86}==$/);
    await expect(verifyPassword('correct horse battery', stored)).resolves.toBe(true);
    await expect(verifyPassword('correct horse batterY', stored)).resolves.toBe(false);
  });

  it('salts: the same password hashes differently each time', async () => {
    const [a, b] = await Promise.all([
      hashPassword('same-password'),
      hashPassword('same-password'),
    ]);
    expect(a).not.toBe(b);
  });

  it('returns false (never throws) for malformed stored values', async () => {
    for (const stored of [
      '',
      'plain',
      'scrypt$x$8$1$AA$BB',
      'bcrypt$1$2$3$4$5',
      'scrypt$16384$8$1$AA$BB',
    ]) {
      await expect(verifyPassword('anything', stored)).resolves.toBe(false);
    }
  });

  it('verifies hashes made with other cost parameters (read from the stored value)', async () => {
    // Made with N = 2^14, r = 8, p = 1 by this module's format (Node's default cost).
    const { scryptSync } = await import('node:crypto');
    const salt = Buffer.from('0123456789abcdef');
    const key = scryptSync('older-password', salt, 64, { N: 16384, r: 8, p: 1 });
    const stored = `scrypt$16384$8$1$${salt.toString('base64')}$${key.toString('base64')}`;
    await expect(verifyPassword('older-password', stored)).resolves.toBe(true);
  });
});
