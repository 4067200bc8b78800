import { createRequire } from 'node:module';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { ComputeRoute } from '@hopwise/common';

/**
 * A small pool of worker threads running the physics core, so a long or pathological computation
 * neither blocks the event loop (other requests keep flowing) nor hangs the server: a task that
 * exceeds the time limit has its worker terminated and replaced.
 */

export type ComputeOutcome =
  | { ok: true; result: unknown }
  | {
      ok: false;
      status: 400 | 422 | 500;
      message: string;
      fields?: Record<string, string>;
      /** Set for ConvergenceError: its message and last state, for the server log. */
      convergence?: string;
      /** Set for unexpected errors: the stack, for the server log only. */
      internal?: string;
    };

export class ComputeTimeoutError extends Error {
  constructor(readonly timeoutMs: number) {
    super(`computation did not finish within ${timeoutMs / 1000} s`);
    this.name = 'ComputeTimeoutError';
  }
}

// The worker imports the built @hopwise/common (an ESM package) by absolute URL, so the same
// code runs under `node api/dist/main.js` and under Vitest.
const COMMON_URL = pathToFileURL(createRequire(import.meta.url).resolve('@hopwise/common')).href;

const WORKER_SOURCE = `
const { parentPort, workerData } = require('node:worker_threads');
const common = import(workerData.commonUrl);
const safeJson = (v) => { try { return JSON.stringify(v).slice(0, 2000); } catch { return String(v); } };
parentPort.on('message', async ({ id, route, body }) => {
  const c = await common;
  try {
    const result = c.runCompute(route, body, { resolveProfile: () => undefined });
    parentPort.postMessage({ id, outcome: { ok: true, result } });
  } catch (err) {
    const mapped = c.computeErrorStatus(err);
    const outcome = { ok: false, status: mapped.status, message: mapped.message, fields: mapped.fields };
    if (err instanceof c.ConvergenceError) outcome.convergence = err.message + '; last state ' + safeJson(err.lastState);
    else if (mapped.status === 500) outcome.internal = String((err && err.stack) || err);
    parentPort.postMessage({ id, outcome });
  }
});
`;

interface Task {
  id: number;
  route: ComputeRoute;
  body: unknown;
  timeoutMs: number;
  resolve: (outcome: ComputeOutcome) => void;
  reject: (err: Error) => void;
}

interface Slot {
  worker: Worker;
  task?: Task;
  timer?: NodeJS.Timeout;
}

export class ComputePool {
  private readonly slots: Slot[] = [];
  private readonly queue: Task[] = [];
  private nextId = 1;
  private closed = false;

  constructor(
    private readonly size: number,
    private readonly timeoutMs: number,
  ) {
    for (let i = 0; i < size; i++) this.slots.push(this.spawn());
  }

  run(route: ComputeRoute, body: unknown, timeoutMs = this.timeoutMs): Promise<ComputeOutcome> {
    if (this.closed) return Promise.reject(new Error('compute pool is closed'));
    return new Promise((resolve, reject) => {
      this.queue.push({ id: this.nextId++, route, body, timeoutMs, resolve, reject });
      this.dispatch();
    });
  }

  async close(): Promise<void> {
    this.closed = true;
    for (const t of this.queue.splice(0)) t.reject(new Error('compute pool is closed'));
    await Promise.all(
      this.slots.map((s) => {
        clearTimeout(s.timer);
        s.task?.reject(new Error('compute pool is closed'));
        return s.worker.terminate();
      }),
    );
  }

  private spawn(): Slot {
    const worker = new Worker(WORKER_SOURCE, { eval: true, workerData: { commonUrl: COMMON_URL } });
    const slot: Slot = { worker };
    worker.on('message', (msg: { id: number; outcome: ComputeOutcome }) => {
      if (slot.task?.id !== msg.id) return;
      const task = slot.task;
      this.release(slot);
      task.resolve(msg.outcome);
    });
    worker.on('error', (err) => this.replace(slot, err));
    worker.on('exit', () => {
      if (!this.closed && this.slots.includes(slot))
        this.replace(slot, new Error('compute worker exited'));
    });
    worker.unref();
    return slot;
  }

  private release(slot: Slot): void {
    clearTimeout(slot.timer);
    slot.task = undefined;
    slot.timer = undefined;
    this.dispatch();
  }

  /** Drops a stuck or crashed worker (failing its task) and starts a fresh one. */
  private replace(slot: Slot, err: Error): void {
    const index = this.slots.indexOf(slot);
    if (index < 0) return;
    clearTimeout(slot.timer);
    const task = slot.task;
    slot.task = undefined;
    if (!this.closed) this.slots[index] = this.spawn();
    else this.slots.splice(index, 1);
    void slot.worker.terminate();
    task?.reject(err);
    this.dispatch();
  }

  private dispatch(): void {
    for (const slot of this.slots) {
      if (this.queue.length === 0) return;
      if (slot.task) continue;
      const task = this.queue.shift() as Task;
      slot.task = task;
      slot.timer = setTimeout(
        () => this.replace(slot, new ComputeTimeoutError(task.timeoutMs)),
        task.timeoutMs,
      );
      slot.worker.postMessage({ id: task.id, route: task.route, body: task.body });
    }
  }
}
