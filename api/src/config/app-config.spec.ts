import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from './app-config.js';

describe('loadConfig', () => {
  const dirs: string[] = [];
  const tmp = () => {
    const d = mkdtempSync(join(tmpdir(), 'hopwise-config-'));
    dirs.push(d);
    return d;
  };
  afterEach(() => {
    for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
  });

  it('applies the documented defaults relative to cwd', () => {
    const cwd = tmp();
    const c = loadConfig({}, cwd);
    expect(c).toMatchObject({
      production: false,
      port: 3000,
      dbFile: join(cwd, 'data/hopwise.sqlite'),
      jwtTtl: '12h',
      demo: true,
      throttleLimitPerMin: 600,
      loginThrottleLimitPerMin: 10,
      appDist: join(cwd, 'app/dist'),
      corsOrigin: undefined,
      jwtSecretSource: 'file',
    });
  });

  it('generates a development secret once, beside the database, mode 0600', () => {
    const cwd = tmp();
    const first = loadConfig({}, cwd);
    const file = join(cwd, 'data', 'jwt-secret');
    expect(readFileSync(file, 'utf8').trim()).toBe(first.jwtSecret);
    expect(statSync(file).mode & 0o777).toBe(0o600);
    expect(first.jwtSecret.length).toBeGreaterThanOrEqual(32);
    expect(loadConfig({}, cwd).jwtSecret).toBe(first.jwtSecret);
  });

  it('requires HOPWISE_JWT_SECRET in production, naming it', () => {
    expect(() => loadConfig({ NODE_ENV: 'production' }, tmp())).toThrow(
      /HOPWISE_JWT_SECRET is required/,
    );
  });

  it('lists every problem at once', () => {
    try {
      loadConfig(
        {
          PORT: 'eighty',
          HOPWISE_DEMO: 'maybe',
          HOPWISE_JWT_TTL: 'forever',
          HOPWISE_THROTTLE_LIMIT: '0',
          HOPWISE_LOGIN_THROTTLE_LIMIT: '-1',
          HOPWISE_JWT_SECRET: 'short',
          HOPWISE_CORS_ORIGIN: 'not a url',
        },
        tmp(),
      );
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(ConfigError);
      const names = (err as ConfigError).problems.map((p) => p.split(' ')[0]);
      expect(names).toEqual([
        'PORT',
        'HOPWISE_JWT_TTL',
        'HOPWISE_THROTTLE_LIMIT',
        'HOPWISE_LOGIN_THROTTLE_LIMIT',
        'HOPWISE_DEMO',
        'HOPWISE_CORS_ORIGIN',
        'HOPWISE_JWT_SECRET',
      ]);
      expect((err as Error).message).toMatch(/^Invalid configuration:\n {2}- PORT/);
    }
  });

  it('reads explicit values', () => {
    const c = loadConfig(
      {
        PORT: '8080',
        HOPWISE_DEMO: '0',
        HOPWISE_JWT_SECRET: 'x'.repeat(40),
        HOPWISE_CORS_ORIGIN: 'http://localhost:5173, https://hopwise.example',
        HOPWISE_DB_FILE: '/var/lib/hopwise/db.sqlite',
      },
      tmp(),
    );
    expect(c).toMatchObject({
      port: 8080,
      demo: false,
      jwtSecretSource: 'env',
      corsOrigin: ['http://localhost:5173', 'https://hopwise.example'],
      dbFile: '/var/lib/hopwise/db.sqlite',
    });
  });

  it('keeps the 2-minute delivery lease by default and accepts a shorter one of at least 1 s', () => {
    expect(loadConfig({}, tmp()).delivery.leaseMs).toBe(120_000);
    expect(loadConfig({ HOPWISE_DELIVERY_LEASE_MS: '2000' }, tmp()).delivery.leaseMs).toBe(2000);
    expect(() => loadConfig({ HOPWISE_DELIVERY_LEASE_MS: '500' }, tmp())).toThrow(
      /HOPWISE_DELIVERY_LEASE_MS must be at least 1000/,
    );
  });
});
