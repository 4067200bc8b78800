import { MIN_PASSWORD_LENGTH } from './password.js';

/**
 * Password rules for new accounts (NIST SP 800-63B §5.1.1.2: a minimum length, and a check
 * against commonly used or expected values, instead of composition rules):
 * at least MIN_PASSWORD_LENGTH characters, not the e-mail address or its local part, not a
 * well-known common password (a short built-in list; common practice), not one repeated character.
 */
const COMMON_PASSWORDS = new Set([
  '1234567890',
  '12345678910',
  '0123456789',
  '1q2w3e4r5t',
  'qwertyuiop',
  'asdfghjkl;',
  'password12',
  'password123',
  'password1234',
  'passw0rd123',
  'iloveyou12',
  'letmein123',
  'welcome123',
  'admin12345',
  'administrator',
  'qwerty1234',
  'qwerty12345',
  'abc1234567',
  'football12',
  'baseball12',
  'sunshine12',
  'princess12',
  'trustno1234',
  'changeme123',
  'hopwise-demo',
  'hopwise123',
  'hopwise1234',
]);

/** The reason the password is refused, or undefined when it is acceptable. */
export function passwordProblem(password: string, email: string): string | undefined {
  if (password.length < MIN_PASSWORD_LENGTH) {
    return `must be at least ${MIN_PASSWORD_LENGTH} characters long`;
  }
  const lower = password.toLowerCase();
  const mail = email.trim().toLowerCase();
  const local = mail.split('@')[0];
  if (lower === mail || (local.length >= 4 && lower.includes(local))) {
    return 'must not contain the e-mail address';
  }
  if (COMMON_PASSWORDS.has(lower)) return 'is too common; choose a longer passphrase';
  if (new Set(lower).size <= 2) return 'must not be one or two repeated characters';
  return undefined;
}
