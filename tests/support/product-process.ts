// The built product (node api/dist/main.js) as a child process on a given SQLite file, for the
// fault tests that kill it and start it again on the same file.
import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
    server.on('error', reject);
  });
}

export interface Product {
  child: ChildProcess;
  baseUrl: string;
  log: () => string;
}

/**
 * Starts the product on a free port with the demo seed, no timers (watch, feed poll, delivery)
 * unless `env` sets them, and waits for /api/health.
 */
export async function startProduct(
  dbFile: string,
  env: Record<string, string> = {},
): Promise<Product> {
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, [path.join(repoRoot, 'api/dist/main.js')], {
    cwd: repoRoot,
    env: {
      ...process.env,
      NODE_ENV: 'test',
      PORT: String(port),
      HOPWISE_DB_FILE: dbFile,
      HOPWISE_JWT_SECRET: 'fault-test-secret-not-for-production-0123',
      HOPWISE_DEMO: '1',
      HOPWISE_THROTTLE_LIMIT: '1000000',
      HOPWISE_LOGIN_THROTTLE_LIMIT: '1000',
      HOPWISE_FEED_POLL_MS: '0',
      HOPWISE_WATCH_INTERVAL_MS: '0',
      HOPWISE_DELIVERY_INTERVAL_MS: '0',
      HOPWISE_COMPUTE_WORKERS: '1',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout?.on('data', (c: Buffer) => (log += c.toString()));
  child.stderr?.on('data', (c: Buffer) => (log += c.toString()));
  try {
    await waitForHealth(baseUrl, child, 60_000);
  } catch (error) {
    child.kill('SIGKILL');
    throw new Error(`${(error as Error).message}\n${log}`, { cause: error });
  }
  return { child, baseUrl, log: () => log };
}

/** Polls `/api/health` until it answers 200; throws if the process exits or time runs out. */
export async function waitForHealth(
  baseUrl: string,
  child: ChildProcess,
  timeoutMs: number,
): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the product exited with code ${child.exitCode}`);
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`the product did not answer ${baseUrl}/api/health within ${timeoutMs} ms`);
}

/** Signs in a demo account (password of the demo seed) and returns the access token. */
export async function signIn(baseUrl: string, email = 'operator@hopwise.test'): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: 'hopwise-demo' }),
  });
  if (res.status !== 200) throw new Error(`sign-in of ${email} answered ${res.status}`);
  return ((await res.json()) as { accessToken: string }).accessToken;
}

export function exited(child: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null) resolve();
    else child.once('exit', () => resolve());
  });
}
