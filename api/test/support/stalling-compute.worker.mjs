// @ts-check
/**
 * The real compute worker, except that the task `plasma` with body `{ "stall": true }` never
 * returns (a busy loop, as a pathological computation would be): for the pool's time-limit and
 * shutdown tests (api/src/compute/compute-pool.spec.ts).
 */
import compute from '../../src/compute/compute.worker.mjs';

export const STALL = '{"stall":true}';

/** @param {import('../../src/compute/compute-task.js').ComputeTask} task */
export default function stallingCompute(task) {
  if (task.kind === 'route' && task.json === STALL) {
    for (;;) {
      // never answers
    }
  }
  return compute(task);
}
