import { setTimeout as sleep } from 'node:timers/promises';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import type { ComputeReply, ComputeTask } from './compute-task.js';

export type { ComputeOutcome, ComputeReply, ComputeTask } from './compute-task.js';

/**
 * The worker threads running the physics core (piscina), so a long or pathological computation
 * neither blocks the event loop (other requests keep flowing) nor hangs the server: a task still
 * unanswered at its time limit is aborted, and if it is running piscina terminates its worker and
 * starts a fresh one. The limit counts from submission, so a task that waited in the queue gets
 * less run time; with sub-second tasks and a limit of seconds that only matters under overload,
 * where answering within a bounded time is the point.
 */

/** The worker module; a plain .mjs file so it loads from the build and under Vitest alike. */
export const COMPUTE_WORKER = fileURLToPath(new URL('./compute.worker.mjs', import.meta.url));

export class ComputeTimeoutError extends Error {
  constructor(readonly timeoutMs: number) {
    super(`computation did not finish within ${timeoutMs / 1000} s`);
    this.name = 'ComputeTimeoutError';
  }
}

/** The pool is closing or closed: the task was not run, or was cancelled. */
export class ComputePoolClosedError extends Error {
  constructor() {
    super('compute pool is closed');
    this.name = 'ComputePoolClosedError';
  }
}

export interface ComputePoolOptions {
  /** Worker threads (all started up front and kept). */
  size: number;
  /** Default time limit per task [ms]. */
  timeoutMs: number;
  /** The worker module (tests substitute one); default compute.worker.mjs. */
  filename?: string;
  /** A worker failure not tied to any task (piscina's 'error' event). */
  onError?: (err: Error) => void;
}

export class ComputePool {
  private readonly piscina: Piscina<ComputeTask, ComputeReply>;
  private readonly timeoutMs: number;
  private readonly running = new Set<Promise<unknown>>();
  private closing = false;

  constructor(options: ComputePoolOptions) {
    this.timeoutMs = options.timeoutMs;
    this.piscina = new Piscina({
      filename: options.filename ?? COMPUTE_WORKER,
      minThreads: options.size,
      maxThreads: options.size,
      concurrentTasksPerWorker: 1,
    });
    const onError = options.onError ?? ((err: Error) => process.emitWarning(err));
    this.piscina.on('error', onError);
  }

  /** Tasks submitted and not yet settled (queued or running). */
  get pending(): number {
    return this.running.size;
  }

  /**
   * Runs one task. Rejects with ComputeTimeoutError over the time limit, ComputePoolClosedError
   * once close() has begun, or the worker's own failure (it exited or could not start).
   */
  run(task: ComputeTask, timeoutMs = this.timeoutMs): Promise<ComputeReply> {
    if (this.closing) return Promise.reject(new ComputePoolClosedError());
    const abort = new AbortController();
    const timer = setTimeout(() => abort.abort(new ComputeTimeoutError(timeoutMs)), timeoutMs);
    const done = this.piscina.run(task, { signal: abort.signal }).then(
      (outcome) => outcome,
      (err: unknown) => {
        if (abort.signal.aborted) throw abort.signal.reason as ComputeTimeoutError;
        if (this.closing) throw new ComputePoolClosedError();
        throw err;
      },
    );
    const tracked = done.finally(() => {
      clearTimeout(timer);
      this.running.delete(tracked);
    });
    this.running.add(tracked);
    return tracked;
  }

  /**
   * Refuses new tasks, lets the submitted ones finish for up to `drainMs`, then stops the
   * workers; tasks still unsettled then reject with ComputePoolClosedError.
   * Returns how many were cancelled that way.
   */
  async close(drainMs = 0): Promise<number> {
    this.closing = true;
    if (this.running.size > 0 && drainMs > 0) {
      await Promise.race([
        Promise.allSettled([...this.running]),
        sleep(drainMs, undefined, { ref: false }),
      ]);
    }
    const cancelled = this.running.size;
    await this.piscina.destroy();
    return cancelled;
  }
}
