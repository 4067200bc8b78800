// Starts the built product (node api/dist/main.js) on a free loopback port with a fresh SQLite
// file and the demo seed, waits for /api/health, and hands its base URL to the tests.
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { freePort, repoRoot, waitForHealth } from './product-process.js';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'hopwise-e2e-'));
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, [path.join(repoRoot, 'api/dist/main.js')], {
    cwd: repoRoot,
    env: {
      ...process.env,
      NODE_ENV: 'test',
      PORT: String(port),
      HOPWISE_DB_FILE: path.join(dataDir, 'hopwise.sqlite'),
      HOPWISE_JWT_SECRET: 'e2e-secret-not-for-production-0123456789',
      HOPWISE_DEMO: '1',
      // Every browser test signs in afresh from 127.0.0.1: lift the per-IP limits (the throttle
      // itself is proven by api/test/throttle.e2e-spec.ts).
      HOPWISE_LOGIN_THROTTLE_LIMIT: '10000',
      HOPWISE_THROTTLE_LIMIT: '100000',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  try {
    await waitForHealth(baseUrl, child, 120_000);
  } catch (error) {
    child.kill('SIGKILL');
    throw new Error(`${(error as Error).message}\n--- product log ---\n${log}`, { cause: error });
  }
  project.provide('baseUrl', baseUrl);
  return async () => {
    child.kill('SIGTERM');
    await new Promise((r) => setTimeout(r, 300));
    if (child.exitCode === null) child.kill('SIGKILL');
    rmSync(dataDir, { recursive: true, force: true });
  };
}
