import { fileURLToPath } from 'node:url';
import { computePlan, diurnalModel, runCompute } from '@hopwise/common';
import { afterEach, describe, expect, it } from 'vitest';
import { ComputePool, ComputePoolClosedError, ComputeTimeoutError } from './compute-pool.js';
import { planTask, routeTask, type ComputeReply, type PlanTaskInput } from './compute-task.js';

/** The real worker, except that `plasma` with `{ stall: true }` never returns. */
const STALLING_WORKER = fileURLToPath(
  new URL('../../test/support/stalling-compute.worker.mjs', import.meta.url),
);
const stall = routeTask('plasma', { stall: true });
const plasma = (frequencyMHz: number) =>
  routeTask('plasma', { plasmaFrequencyMHz: 3, frequencyMHz });

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
    pool = undefined;
  });

  it('runs routes and plans in worker threads: the same results as in-process, errors mapped', async () => {
    pool = new ComputePool({ size: 2, timeoutMs: 60_000 });
    const okBody = { electronDensityPerM3: 1e12, frequencyMHz: 10 };
    const planInput: PlanTaskInput = {
      from: { latDeg: 48.1, lonDeg: 11.6 },
      to: { latDeg: 40.4, lonDeg: -3.7 },
      dateUtc: '2026-03-20',
      channelsKHz: [5000, 7045, 10100, 14100],
      slotMinutes: 60,
      profile: 'model',
    };
    const [ok, bad, none, plan, planBad] = await Promise.all([
      pool.run(routeTask('plasma', okBody)),
      pool.run(routeTask('plasma', { electronDensityPerM3: 1e12, frequencyMHz: 'ten' })),
      pool.run(routeTask('slant', { profile, frequencyMHz: 5, elevationDeg: 90 })),
      pool.run(planTask(planInput)),
      pool.run(planTask({ ...planInput, to: planInput.from })),
    ]);
    expect(ok).toEqual({ ok: true, result: runCompute('plasma', okBody) });
    expect(bad).toMatchObject({
      ok: false,
      status: 400,
      fields: { frequencyMHz: expect.any(String) },
    });
    expect(none).toMatchObject({ ok: false, status: 422 });
    const { profile: _model, ...ends } = planInput;
    expect(plan).toEqual({
      ok: true,
      result: computePlan({ ...ends, profileAt: (at, p) => diurnalModel(p, at).profile }),
    });
    expect(planBad).toMatchObject({ ok: false, status: 400, fields: { to: expect.any(String) } });
  });

  it('answers with the outcome as JSON text when asked (what the result cache keeps)', async () => {
    pool = new ComputePool({ size: 1, timeoutMs: 60_000 });
    const text = await pool.run({ ...plasma(10), serialize: true });
    expect(typeof text).toBe('string');
    expect(JSON.parse(text as string)).toEqual(await pool.run(plasma(10)));
  });

  it('stops a task over its time limit, replaces the worker and keeps serving', async () => {
    pool = new ComputePool({ size: 1, timeoutMs: 60_000, filename: STALLING_WORKER });
    await pool.run(plasma(1)); // the worker has loaded the physics: the next task really runs
    const stalled = pool.run(stall, 300);
    // Queued behind the stalled task on the only worker: served once that worker is replaced.
    const next = pool.run(plasma(5));
    await expect(stalled).rejects.toBeInstanceOf(ComputeTimeoutError);
    await expect(stalled).rejects.toThrow('computation did not finish within 0.3 s');
    await expect(next).resolves.toMatchObject({ ok: true, result: { propagates: true } });
    expect(pool.pending).toBe(0);
  });

  it('runs tasks concurrently on its workers: one stalled worker does not hold up the other', async () => {
    pool = new ComputePool({ size: 2, timeoutMs: 60_000, filename: STALLING_WORKER });
    const stalled = pool.run(stall).catch((err: unknown) => err);
    const outcomes = await Promise.all([1, 2, 3, 4, 5].map((f) => pool!.run(plasma(f))));
    const propagates = (o: ComputeReply) =>
      typeof o !== 'string' && o.ok && (o.result as { propagates: boolean }).propagates;
    expect(outcomes.map(propagates)).toEqual([false, false, false, true, true]);
    expect(pool.pending).toBe(1);
    // The stalled task is still running; closing stops it.
    expect(await pool.close()).toBe(1);
    expect(await stalled).toBeInstanceOf(ComputePoolClosedError);
  });

  it('on close lets submitted tasks finish within the drain time, stops the rest and refuses new ones', async () => {
    pool = new ComputePool({ size: 2, timeoutMs: 60_000, filename: STALLING_WORKER });
    const stalled = pool.run(stall).catch((err: unknown) => err);
    await pool.run(plasma(1)); // the other worker is loaded, so the next task takes milliseconds
    const finishing = pool.run(plasma(5));
    // The drain ends when the stalled task is given up on: after the 2 s.
    const cancelled = await pool.close(2_000);
    await expect(finishing).resolves.toMatchObject({ ok: true });
    expect(await stalled).toBeInstanceOf(ComputePoolClosedError);
    expect(cancelled).toBe(1);
    await expect(pool.run(plasma(5))).rejects.toBeInstanceOf(ComputePoolClosedError);
  });
});
