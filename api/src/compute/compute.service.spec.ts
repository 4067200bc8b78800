import { computePlan, diurnalModel, runCompute, type ProfileData } from '@hopwise/common';
import { Logger } from '@nestjs/common';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import type { AppConfig } from '../config/app-config.js';
import { ApiException } from '../http/api-error.js';
import type { ProfileLookup } from '../profiles/profile-lookup.js';
import { ComputePool, ComputePoolClosedError, ComputeTimeoutError } from './compute-pool.js';
import { SHUTTING_DOWN, ComputeService } from './compute.service.js';
import type { PlanTaskInput } from './compute-task.js';

const layer = (criticalFrequencyMHz: number) => ({
  name: 'F2',
  shape: 'parabolic' as const,
  criticalFrequencyMHz,
  peakHeightKm: 300,
  semiThicknessKm: 100,
});
const user = {
  id: 7,
  email: 'op@hopwise.test',
  displayName: 'op',
  role: 'operator' as const,
  disabled: false,
  createdAt: '2026-01-01T00:00:00.000Z',
};

/** The stored profile 1 of this user, editable by the test. */
let stored: ProfileData;
const lookup = {
  resolveForUser: (id: number) => (id === 1 ? stored : undefined),
} as unknown as ProfileLookup;

function service(computeCacheMb = 64): ComputeService {
  const config = { computeWorkers: 1, computeTimeoutMs: 60_000, computeCacheMb } as AppConfig;
  return new ComputeService(config, lookup);
}

/** How the service's requests reached the pool: the pool's run, counted. */
const dispatches = () => vi.mocked(ComputePool.prototype.run).mock.calls.length;

async function failure(p: Promise<unknown>): Promise<{ status: number; body: unknown }> {
  const err = await p.then(
    () => expect.unreachable('should have failed'),
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(ApiException);
  return { status: (err as ApiException).getStatus(), body: (err as ApiException).getResponse() };
}

const plasmaBody = { electronDensityPerM3: 1e12, frequencyMHz: 10 };

describe('ComputeService', () => {
  let s: ComputeService | undefined;
  beforeAll(() => Logger.overrideLogger(false));
  afterEach(async () => {
    await s?.onModuleDestroy();
    s = undefined;
    vi.restoreAllMocks();
  });
  const spyPool = () => vi.spyOn(ComputePool.prototype, 'run');

  it('answers an equal request (any key order) from the cache without the pool', async () => {
    s = service();
    spyPool();
    const first = await s.run('plasma', plasmaBody);
    const second = await s.run('plasma', { frequencyMHz: 10, electronDensityPerM3: 1e12 });
    expect(first).toEqual(runCompute('plasma', plasmaBody));
    expect(second).toEqual(first);
    expect(dispatches()).toBe(1);
    await s.run('plasma', { ...plasmaBody, frequencyMHz: 11 });
    expect(dispatches()).toBe(2);
  });

  it('gives every caller its own copy: changing one answer changes no other', async () => {
    s = service();
    const [a, b] = (await Promise.all([1, 2].map(() => s!.run('plasma', plasmaBody)))) as {
      refractiveIndex: number;
    }[];
    a.refractiveIndex = -1;
    expect(b.refractiveIndex).toBeGreaterThan(0);
    const c = (await s.run('plasma', plasmaBody)) as { refractiveIndex: number };
    expect(c.refractiveIndex).toBe(b.refractiveIndex);
  });

  it('computes identical concurrent requests once', async () => {
    s = service();
    spyPool();
    const results = await Promise.all([1, 2, 3].map(() => s!.run('plasma', plasmaBody)));
    expect(results).toEqual([results[0], results[0], results[0]]);
    expect(dispatches()).toBe(1);
  });

  it('keys a stored profile by its content: editing it misses the cache', async () => {
    s = service();
    spyPool();
    const body = { profile: { id: 1 }, frequenciesMHz: [4, 6] };
    stored = { layers: [layer(7)] };
    const before = await s.run('vertical', body, user);
    expect(await s.run('vertical', body, user)).toEqual(before);
    expect(dispatches()).toBe(1);
    stored = { layers: [layer(5)] };
    const after = await s.run('vertical', body, user);
    expect(dispatches()).toBe(2);
    expect(after).toEqual(runCompute('vertical', { ...body, profile: stored }));
    expect(after).not.toEqual(before);
  });

  it('caches 400 and 422 answers as well', async () => {
    s = service();
    spyPool();
    const bad = { electronDensityPerM3: 1e12, frequencyMHz: 'ten' };
    const none = { profile: { layers: [layer(7)] }, frequencyMHz: 5, elevationDeg: 90 };
    const first = [await failure(s.run('plasma', bad)), await failure(s.run('slant', none))];
    const again = [await failure(s.run('plasma', bad)), await failure(s.run('slant', none))];
    expect(first.map((f) => f.status)).toEqual([400, 422]);
    expect(first[0].body).toMatchObject({ fields: { frequencyMHz: expect.any(String) } });
    expect(again).toEqual(first);
    expect(dispatches()).toBe(2);
  });

  it('HOPWISE_COMPUTE_CACHE_MB=0 computes every request', async () => {
    s = service(0);
    spyPool();
    await s.run('plasma', plasmaBody);
    await s.run('plasma', plasmaBody);
    expect(dispatches()).toBe(2);
  });

  it('does not cache a 500 or a time-out', async () => {
    s = service();
    spyPool()
      .mockResolvedValueOnce({ ok: false, status: 500, message: 'internal error', internal: 'x' })
      .mockRejectedValueOnce(new ComputeTimeoutError(20_000));
    await expect(s.run('plasma', plasmaBody)).rejects.toThrow('plasma: x');
    expect(await failure(s.run('plasma', plasmaBody))).toMatchObject({
      status: 422,
      body: { message: 'No answer: the computation did not finish within 20 s' },
    });
    expect(await s.run('plasma', plasmaBody)).toEqual(runCompute('plasma', plasmaBody));
    expect(dispatches()).toBe(3);
  });

  it('plans in the pool (the in-process plan) and caches the plan', async () => {
    s = service();
    spyPool();
    const input: PlanTaskInput = {
      from: { latDeg: 52.5, lonDeg: 13.4 },
      to: { latDeg: 41.9, lonDeg: 12.5 },
      dateUtc: '2026-06-21',
      channelsKHz: [3600, 7045, 10100],
      slotMinutes: 60,
      profile: 'model',
    };
    const plan = await s.plan(input);
    const { profile: _model, ...ends } = input;
    expect(plan).toEqual(
      computePlan({ ...ends, profileAt: (at, p) => diurnalModel(p, at).profile }),
    );
    expect(await s.plan({ ...input })).toEqual(plan);
    expect(dispatches()).toBe(1);
  });

  it('lets a running computation finish on shutdown, then answers 503', async () => {
    s = service();
    const running = s.run('plasma', plasmaBody);
    await s.onModuleDestroy();
    await expect(running).resolves.toEqual(runCompute('plasma', plasmaBody));
    expect(await failure(s.run('plasma', plasmaBody))).toEqual({
      status: 503,
      body: { statusCode: 503, error: 'Service Unavailable', message: SHUTTING_DOWN },
    });
  });

  it('answers 503 for a computation stopped by the shutdown', async () => {
    s = service();
    spyPool().mockRejectedValueOnce(new ComputePoolClosedError());
    expect(await failure(s.run('plasma', plasmaBody))).toMatchObject({
      status: 503,
      body: { message: SHUTTING_DOWN },
    });
  });
});
