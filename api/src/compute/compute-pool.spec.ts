import { afterEach, describe, expect, it } from 'vitest';
import { ComputePool, ComputeTimeoutError } from './compute-pool.js';

const profile = {
  layers: [
    {
      name: 'F2',
      shape: 'parabolic',
      criticalFrequencyMHz: 7,
      peakHeightKm: 300,
      semiThicknessKm: 100,
    },
  ],
};

describe('ComputePool', () => {
  let pool: ComputePool | undefined;
  afterEach(async () => {
    await pool?.close();
  });

  it('runs routes in worker threads and returns results and mapped errors', async () => {
    pool = new ComputePool(2, 60_000);
    const [ok, bad, none] = await Promise.all([
      pool.run('plasma', { electronDensityPerM3: 1e12, frequencyMHz: 10 }),
      pool.run('plasma', { electronDensityPerM3: 1e12, frequencyMHz: 'ten' }),
      pool.run('slant', { profile, frequencyMHz: 5, elevationDeg: 90 }),
    ]);
    expect(ok).toMatchObject({ ok: true, result: { propagates: true } });
    expect(bad).toMatchObject({
      ok: false,
      status: 400,
      fields: { frequencyMHz: expect.any(String) },
    });
    expect(none).toMatchObject({ ok: false, status: 422 });
  });

  it('stops a task over its time limit, replaces the worker and keeps serving', async () => {
    pool = new ComputePool(1, 60_000);
    // 1 ms is far shorter than a fresh worker needs just to load the physics module, so this task
    // cannot finish in time whatever the machine's speed.
    await expect(
      pool.run('plasma', { electronDensityPerM3: 1e12, frequencyMHz: 10 }, 1),
    ).rejects.toBeInstanceOf(ComputeTimeoutError);
    await expect(
      pool.run('plasma', { electronDensityPerM3: 1e12, frequencyMHz: 10 }),
    ).resolves.toMatchObject({
      ok: true,
    });
  });

  it('queues more tasks than workers', async () => {
    pool = new ComputePool(1, 60_000);
    const outcomes = await Promise.all(
      [1, 2, 3, 4, 5].map((f) => pool!.run('plasma', { plasmaFrequencyMHz: 3, frequencyMHz: f })),
    );
    expect(outcomes.map((o) => o.ok && (o.result as { propagates: boolean }).propagates)).toEqual([
      false,
      false,
      false,
      true,
      true,
    ]);
  });
});
