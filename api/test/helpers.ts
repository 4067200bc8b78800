import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import type { App } from 'supertest/types.js';
import { createApp } from '../src/app.factory.js';
import type { AppConfig } from '../src/config/app-config.js';
import { DB } from '../src/db/database.module.js';
import type { Db } from '../src/db/open-database.js';
import { DEMO_PASSWORD } from '../src/seed/demo-seed.js';

export { DEMO_PASSWORD };

export interface TestApp {
  app: NestExpressApplication;
  http: App;
  config: AppConfig;
  db: Db;
  dir: string;
  close(): Promise<void>;
}

/**
 * Boots the real application on a fresh SQLite file in the OS temp folder. Throttling stays on
 * with limits high enough not to interfere, unless a test sets them. The conditions feed is
 * polled only on demand (POST /api/conditions/poll), so feed profiles appear when a test asks.
 */
export async function bootApp(env: Record<string, string> = {}): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'hopwise-api-'));
  const { app, config } = await createApp({
    env: {
      NODE_ENV: 'test',
      HOPWISE_DB_FILE: join(dir, 'test.sqlite'),
      HOPWISE_APP_DIST: join(dir, 'no-client-here'),
      HOPWISE_THROTTLE_LIMIT: '100000',
      HOPWISE_LOGIN_THROTTLE_LIMIT: '100000',
      HOPWISE_COMPUTE_WORKERS: '1',
      HOPWISE_FEED_POLL_MS: '0',
      ...env,
    },
    cwd: dir,
    logger: false,
  });
  await app.init();
  return {
    app,
    http: app.getHttpServer() as App,
    config,
    db: app.get<Db>(DB),
    dir,
    async close() {
      await app.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export async function login(http: App, email: string, password = DEMO_PASSWORD): Promise<string> {
  const res = await request(http).post('/api/auth/login').send({ email, password }).expect(200);
  return (res.body as { accessToken: string }).accessToken;
}

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
