#!/usr/bin/env node
// Load test: starts the BUILT product (api/dist/main.js) on a free loopback port with a temp
// database and a high throttle limit, signs in, and drives it with autocannon.
//   npm run load            — each scenario for HOPWISE_LOAD_SECONDS (default 10 s)
//   npm run soak            — the mixed workload for 10 minutes, server RSS sampled every 30 s
// Prints req/s, p50/p99 latency, errors and non-2xx, and the server's RSS (/proc/<pid>/status).
// Targets on a 2-core machine: compute/oblique ≥ 500 req/s with p99 ≤ 50 ms; lists ≥ 2000 req/s;
// 0 errors; RSS flat over the soak. A benchmark, not a test: it reports, it does not assert.
// `oblique same` repeats one body (answered from the compute cache after the first);
// `oblique sweep` a new frequency on one of 8 paths (MUFs of a path reused by the worker);
// `oblique fresh` draws a new frequency and range per request (everything computed). The health
// route (no sign-in, no database) is the framework's ceiling on this machine, for scale.
import autocannon from 'autocannon';
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const soak = process.argv.includes('--soak');
const seconds = Number(process.env.HOPWISE_LOAD_SECONDS ?? 10);
const connections = Number(process.env.HOPWISE_LOAD_CONNECTIONS ?? 16);
const soakSeconds = Number(process.env.HOPWISE_SOAK_SECONDS ?? 600);

const main = path.join(root, 'api/dist/main.js');
if (!existsSync(main)) {
  console.error('No build at api/dist/main.js: run `npm run build` first.');
  process.exit(1);
}

const freePort = () =>
  new Promise((resolve, reject) => {
    const s = createServer();
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
    s.on('error', reject);
  });

const rssMiB = (pid) => {
  const m = /VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
  return m ? Number(m[1]) / 1024 : NaN;
};

const dir = mkdtempSync(path.join(tmpdir(), 'hopwise-load-'));
const port = await freePort();
const base = `http://127.0.0.1:${port}`;
const child = spawn(process.execPath, [main], {
  cwd: root,
  env: {
    ...process.env,
    NODE_ENV: 'test',
    PORT: String(port),
    HOPWISE_DB_FILE: path.join(dir, 'hopwise.sqlite'),
    HOPWISE_JWT_SECRET: 'load-test-secret-not-for-production-012345',
    HOPWISE_DEMO: '1',
    HOPWISE_THROTTLE_LIMIT: '1000000',
    HOPWISE_LOGIN_THROTTLE_LIMIT: '1000000',
  },
  stdio: ['ignore', 'ignore', 'inherit'],
});
const cleanup = () => {
  if (child.exitCode === null) child.kill('SIGTERM');
  rmSync(dir, { recursive: true, force: true });
};
process.on('SIGINT', () => {
  cleanup();
  process.exit(130);
});

try {
  for (let i = 0; ; i++) {
    if (child.exitCode !== null) throw new Error(`the product exited with ${child.exitCode}`);
    try {
      if ((await fetch(`${base}/api/health`)).ok) break;
    } catch {
      /* not yet */
    }
    if (i > 300) throw new Error('the product did not start in 60 s');
    await new Promise((r) => setTimeout(r, 200));
  }
  const loginBody = JSON.stringify({ email: 'operator@hopwise.test', password: 'hopwise-demo' });
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: loginBody,
  });
  const { accessToken } = await login.json();
  const auth = { Authorization: `Bearer ${accessToken}`, 'Content-Type': 'application/json' };
  const quietDay = JSON.parse(readFileSync(path.join(root, 'profiles/quiet-day.json'), 'utf8'));
  const profile = quietDay.profile ?? { layers: quietDay.layers };
  const oblique = JSON.stringify({ profile, frequencyMHz: 10, groundRangeKm: 1500 });
  // A fresh frequency and range per request, so the server's compute cache cannot answer it:
  // the cost of the physics itself (5–14 MHz, 800–2500 km, three decimals).
  const freshOblique = (req) => ({
    ...req,
    body: JSON.stringify({
      profile,
      frequencyMHz: Number((5 + 9 * Math.random()).toFixed(3)),
      groundRangeKm: Number((800 + 1700 * Math.random()).toFixed(3)),
    }),
  });
  const plan = JSON.stringify({
    from: { latDeg: 47.2, lonDeg: 8.6 },
    to: { latDeg: 51.5, lonDeg: -0.1 },
    dateUtc: '2026-03-20',
    channelsKHz: [4625, 7150, 9145, 13992],
    profileSource: 'model',
  });
  const planOk =
    (await fetch(`${base}/api/compute/plan`, { method: 'POST', headers: auth, body: plan }))
      .status === 200;
  const obliqueStatus = (
    await fetch(`${base}/api/compute/oblique`, { method: 'POST', headers: auth, body: oblique })
  ).status;
  if (obliqueStatus !== 200) console.warn(`warning: compute/oblique answered ${obliqueStatus}`);

  // A fresh frequency on one of 8 paths: users sweeping the channels of a few links (the
  // worker reuses each path's MUF search; the answer cache cannot help).
  const sweepOblique = (req) => ({
    ...req,
    body: JSON.stringify({
      profile,
      frequencyMHz: Number((5 + 9 * Math.random()).toFixed(3)),
      groundRangeKm: 800 + 200 * Math.floor(8 * Math.random()),
    }),
  });

  const scenarios = {
    'GET /api/health (no sign-in)': [{ method: 'GET', path: '/api/health' }],
    'GET /api/stations': [{ method: 'GET', path: '/api/stations', headers: auth }],
    'GET /api/profiles': [{ method: 'GET', path: '/api/profiles', headers: auth }],
    'POST /api/compute/oblique same': [
      { method: 'POST', path: '/api/compute/oblique', headers: auth, body: oblique },
    ],
    'POST /api/compute/oblique sweep': [
      { method: 'POST', path: '/api/compute/oblique', headers: auth, setupRequest: sweepOblique },
    ],
    'POST /api/compute/oblique fresh': [
      { method: 'POST', path: '/api/compute/oblique', headers: auth, setupRequest: freshOblique },
    ],
    ...(planOk
      ? {
          'POST /api/compute/plan': [
            { method: 'POST', path: '/api/compute/plan', headers: auth, body: plan },
          ],
        }
      : {}),
    'POST /api/auth/login (scrypt)': [
      {
        method: 'POST',
        path: '/api/auth/login',
        headers: { 'Content-Type': 'application/json' },
        body: loginBody,
      },
    ],
    mixed: [
      { method: 'GET', path: '/api/stations', headers: auth },
      { method: 'GET', path: '/api/links', headers: auth },
      { method: 'GET', path: '/api/profiles', headers: auth },
      { method: 'POST', path: '/api/compute/oblique', headers: auth, body: oblique },
      { method: 'GET', path: '/api/stations', headers: auth },
      { method: 'POST', path: '/api/compute/oblique', headers: auth, setupRequest: freshOblique },
      ...(planOk ? [{ method: 'POST', path: '/api/compute/plan', headers: auth, body: plan }] : []),
    ],
  };

  const run = (title, requests, duration) =>
    autocannon({ url: base, connections, duration, requests, title });
  const line = (title, r, rss) =>
    console.log(
      `${title.padEnd(32)} ${r.requests.average.toFixed(0).padStart(6)} req/s  ` +
        `p50 ${String(r.latency.p50).padStart(4)} ms  p99 ${String(r.latency.p99).padStart(4)} ms  ` +
        `errors ${r.errors + r.timeouts}  non-2xx ${r.non2xx}  RSS ${rss.toFixed(0)} MiB`,
    );

  console.log(`Hopwise load on ${base}: ${connections} connections, node ${process.version}`);
  console.log(`server RSS at start ${rssMiB(child.pid).toFixed(0)} MiB`);
  if (!soak) {
    for (const [title, requests] of Object.entries(scenarios)) {
      const duration = title.includes('login') ? Math.min(5, seconds) : seconds;
      line(title, await run(title, requests, duration), rssMiB(child.pid));
    }
  } else {
    const samples = [];
    const timer = setInterval(() => samples.push(rssMiB(child.pid)), 30_000);
    const r = await run('soak (mixed)', scenarios.mixed, soakSeconds);
    clearInterval(timer);
    line('soak (mixed)', r, rssMiB(child.pid));
    console.log(`RSS every 30 s [MiB]: ${samples.map((s) => s.toFixed(0)).join(' ')}`);
  }
} finally {
  cleanup();
}
