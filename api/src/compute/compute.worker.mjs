// @ts-check
/**
 * The compute worker that piscina runs in each thread of the pool (compute-pool.ts): one task
 * (compute-task.ts) in, one outcome out; nothing thrown crosses the thread boundary.
 *
 * Plain ES module JavaScript (type-checked through JSDoc) rather than TypeScript, so the one file
 * runs both from the build (tsc copies it to api/dist/compute/ with `allowJs`) and under Vitest,
 * which runs the API's TypeScript sources but cannot give a .ts file to a worker thread on
 * Node 20. It imports the built @hopwise/common by its package name, which resolves from either
 * place.
 */
import {
  ConvergenceError,
  computeErrorStatus,
  computePlan,
  diurnalModel,
  runCompute,
} from '@hopwise/common';

/** @typedef {import('./compute-task.js').ComputeTask} ComputeTask */
/** @typedef {import('./compute-task.js').ComputeOutcome} ComputeOutcome */
/** @typedef {import('./compute-task.js').ComputeReply} ComputeReply */
/** @typedef {import('./compute-task.js').PlanTaskInput} PlanTaskInput */

/** @param {unknown} v */
const safeJson = (v) => {
  try {
    return String(JSON.stringify(v)).slice(0, 2000);
  } catch {
    return String(v);
  }
};

/** @param {PlanTaskInput} input */
function plan(input) {
  const { profile, ...rest } = input;
  return computePlan({
    ...rest,
    profileAt: profile === 'model' ? (at, point) => diurnalModel(point, at).profile : () => profile,
  });
}

/**
 * @param {ComputeTask} task
 * @returns {ComputeReply}
 */
export default function compute(task) {
  /** @type {ComputeOutcome} */
  let outcome;
  try {
    const input = task.json === '' ? undefined : JSON.parse(task.json);
    const result =
      task.kind === 'plan'
        ? plan(input)
        : // Stored profiles were resolved in the main thread; an id left here is unknown.
          runCompute(task.route, input, { resolveProfile: () => undefined });
    outcome = { ok: true, result };
  } catch (err) {
    const mapped = computeErrorStatus(err);
    outcome = { ok: false, status: mapped.status, message: mapped.message };
    if (mapped.fields) outcome.fields = mapped.fields;
    if (err instanceof ConvergenceError) {
      outcome.convergence = `${err.message}; last state ${safeJson(err.lastState)}`;
    } else if (mapped.status === 500) {
      outcome.internal = String((err instanceof Error && err.stack) || err);
    }
  }
  return task.serialize ? JSON.stringify(outcome) : outcome;
}
