import { randomBytes } from 'node:crypto';
import { availableParallelism } from 'node:os';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { loadFeedConfig, type FeedConfig } from '../conditions/feed-config.js';
import { loadDeliveryConfig, type DeliveryConfig } from '../delivery/delivery-config.js';

/** Validated server configuration (read once at start-up from the environment). */
export interface AppConfig {
  production: boolean;
  port: number;
  /** Absolute path of the SQLite file. */
  dbFile: string;
  jwtSecret: string;
  /** Where the secret came from, for the start-up log. */
  jwtSecretSource: 'env' | 'file';
  /** Token lifetime in the `ms`/jsonwebtoken notation, e.g. `12h`. */
  jwtTtl: string;
  demo: boolean;
  throttleLimitPerMin: number;
  loginThrottleLimitPerMin: number;
  /** Absolute path of the built client (may not exist). */
  appDist: string;
  /** `undefined` = no CORS headers at all. */
  corsOrigin: string[] | undefined;
  /** Worker threads running the compute routes. */
  computeWorkers: number;
  /** A computation running longer is stopped and answered 422. */
  computeTimeoutMs: number;
  /** Size bound of the compute result cache [MB]; 0 = no cache. */
  computeCacheMb: number;
  /** Watch timer, Web Push and e-mail (api/src/delivery/delivery-config.ts). */
  delivery: DeliveryConfig;
  /** Conditions feed (api/src/conditions/feed-config.ts). */
  feed: FeedConfig;
}

export type Env = Record<string, string | undefined>;

export const APP_CONFIG = Symbol('APP_CONFIG');

export class ConfigError extends Error {
  constructor(readonly problems: string[]) {
    super(`Invalid configuration:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
    this.name = 'ConfigError';
  }
}

const DEFAULTS = {
  PORT: '3000',
  HOPWISE_DB_FILE: 'data/hopwise.sqlite',
  HOPWISE_JWT_TTL: '12h',
  HOPWISE_THROTTLE_LIMIT: '600',
  HOPWISE_LOGIN_THROTTLE_LIMIT: '10',
  HOPWISE_APP_DIST: 'app/dist',
  HOPWISE_COMPUTE_WORKERS: String(Math.max(1, Math.min(4, availableParallelism()))),
  HOPWISE_COMPUTE_TIMEOUT_MS: '20000',
  HOPWISE_COMPUTE_CACHE_MB: '16',
} as const;

const MIN_SECRET_LENGTH = 32;
const SECRET_FILE_NAME = 'jwt-secret';

function intIn(
  env: Env,
  name: keyof typeof DEFAULTS,
  min: number,
  max: number,
  problems: string[],
): number {
  const raw = (env[name] ?? DEFAULTS[name]).trim();
  const value = Number(raw);
  if (!/^\d+$/.test(raw) || !Number.isSafeInteger(value) || value < min || value > max) {
    problems.push(`${name} must be an integer from ${min} to ${max} (got "${raw}")`);
    return Number(DEFAULTS[name]);
  }
  return value;
}

function flag(env: Env, name: string, fallback: boolean, problems: string[]): boolean {
  const raw = env[name]?.trim().toLowerCase();
  if (raw === undefined || raw === '') return fallback;
  if (['1', 'true', 'yes', 'on'].includes(raw)) return true;
  if (['0', 'false', 'no', 'off'].includes(raw)) return false;
  problems.push(`${name} must be 0 or 1 (got "${env[name]}")`);
  return fallback;
}

/**
 * Development secret: generated once with a CSPRNG and kept beside the database (mode 0600),
 * so tokens survive restarts without any set-up.
 */
function devSecret(dbFile: string): string {
  const file = resolve(dirname(dbFile), SECRET_FILE_NAME);
  if (existsSync(file)) {
    const stored = readFileSync(file, 'utf8').trim();
    if (stored.length >= MIN_SECRET_LENGTH) return stored;
  }
  mkdirSync(dirname(file), { recursive: true });
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}

/**
 * Reads and validates the environment. Throws a ConfigError listing every problem at once.
 * Relative paths resolve against `cwd` (the repo root when started with `npm start`).
 */
export function loadConfig(env: Env = process.env, cwd = process.cwd()): AppConfig {
  const problems: string[] = [];
  const production = env.NODE_ENV === 'production';

  const port = intIn(env, 'PORT', 0, 65535, problems);
  const dbFileRaw = env.HOPWISE_DB_FILE?.trim() || DEFAULTS.HOPWISE_DB_FILE;
  const dbFile = resolve(cwd, dbFileRaw);

  const jwtTtl = (env.HOPWISE_JWT_TTL?.trim() || DEFAULTS.HOPWISE_JWT_TTL).toLowerCase();
  if (!/^\d+(s|m|h|d)?$/.test(jwtTtl) || /^0+[smhd]?$/.test(jwtTtl)) {
    problems.push(
      `HOPWISE_JWT_TTL must be a positive duration like 900s, 30m, 12h or 7d (got "${jwtTtl}")`,
    );
  }

  const throttleLimitPerMin = intIn(env, 'HOPWISE_THROTTLE_LIMIT', 1, 1_000_000, problems);
  const loginThrottleLimitPerMin = intIn(
    env,
    'HOPWISE_LOGIN_THROTTLE_LIMIT',
    1,
    1_000_000,
    problems,
  );
  const computeWorkers = intIn(env, 'HOPWISE_COMPUTE_WORKERS', 1, 64, problems);
  const computeTimeoutMs = intIn(env, 'HOPWISE_COMPUTE_TIMEOUT_MS', 100, 600_000, problems);
  const computeCacheMb = intIn(env, 'HOPWISE_COMPUTE_CACHE_MB', 0, 4096, problems);
  const demo = flag(env, 'HOPWISE_DEMO', true, problems);
  const appDist = resolve(cwd, env.HOPWISE_APP_DIST?.trim() || DEFAULTS.HOPWISE_APP_DIST);

  const corsRaw = env.HOPWISE_CORS_ORIGIN?.trim();
  const corsOrigin = corsRaw
    ? corsRaw
        .split(',')
        .map((s) => s.trim())
        .filter(Boolean)
    : undefined;
  for (const origin of corsOrigin ?? []) {
    if (!/^https?:\/\/[^/\s]+$/.test(origin)) {
      problems.push(
        `HOPWISE_CORS_ORIGIN must be a comma-separated list of origins like https://example.org (got "${origin}")`,
      );
    }
  }

  let jwtSecret = env.HOPWISE_JWT_SECRET?.trim() ?? '';
  let jwtSecretSource: AppConfig['jwtSecretSource'] = 'env';
  if (jwtSecret) {
    if (jwtSecret.length < MIN_SECRET_LENGTH) {
      problems.push(`HOPWISE_JWT_SECRET must be at least ${MIN_SECRET_LENGTH} characters long`);
    }
  } else if (production) {
    problems.push(
      'HOPWISE_JWT_SECRET is required when NODE_ENV=production (e.g. `openssl rand -base64 48`)',
    );
  }

  const delivery = loadDeliveryConfig(env, production, port, problems);
  const feed = loadFeedConfig(env, problems);

  if (problems.length > 0) throw new ConfigError(problems);

  if (!jwtSecret) {
    jwtSecret = devSecret(dbFile);
    jwtSecretSource = 'file';
  }

  return {
    production,
    port,
    dbFile,
    jwtSecret,
    jwtSecretSource,
    jwtTtl,
    demo,
    throttleLimitPerMin,
    loginThrottleLimitPerMin,
    appDist,
    corsOrigin,
    computeWorkers,
    computeTimeoutMs,
    computeCacheMb,
    delivery,
    feed,
  };
}
