import { createHash } from 'node:crypto';
import type { ComputeRoute, PlanResponse, UserView } from '@hopwise/common';
import { Inject, Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { LRUCache } from 'lru-cache';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { ApiException, badRequest } from '../http/api-error.js';
import { ProfileLookup } from '../profiles/profile-lookup.js';
import { ComputePool, ComputePoolClosedError, ComputeTimeoutError } from './compute-pool.js';
import {
  planTask,
  routeTask,
  type ComputeOutcome,
  type ComputeTask,
  type PlanTaskInput,
} from './compute-task.js';

export const NO_CONVERGED_SOLUTION = 'no converged solution';
export const SHUTTING_DOWN = 'Server is shutting down, try again';
/** On shutdown, computations already submitted get this long to finish [ms]. */
export const DRAIN_MS = 5000;

const shuttingDown = () => new ApiException(503, SHUTTING_DOWN);

/**
 * Runs the physics core (runCompute and the plan from common) in the worker pool and maps its
 * outcome to the one error shape via computeErrorStatus: InputError → 400 with fields by dotted
 * path, NoSolutionError → 422, ConvergenceError → 422 (logged: ill-conditioning or a bug, not the
 * user's fault), over the time limit → 422. Unexpected errors are logged and become a generic 500.
 * While the app shuts down, compute requests answer 503.
 *
 * Stored profiles (`profile: { id }`) are resolved here, in the main thread, by replacing the id
 * with the stored layers/samples before dispatch (ProfileLookup: own, published, or any for an
 * admin); an id the user may not see answers 400 naming `profile.id`.
 *
 * Result cache: a computation is a pure function of its task, the route plus the canonical JSON
 * of the request body after stored-profile resolution (the plan: of its input with the profile
 * source resolved to the model or a profile's data). No clock, no database, no randomness reach
 * the worker, so equal tasks give equal answers and caching them is safe; editing a stored
 * profile or a new feed update changes the task and so misses. Results and 400/422 answers are
 * kept (LRU, bounded by their JSON length, HOPWISE_COMPUTE_CACHE_MB; the objects take about
 * 1.5× that of heap); 500s, time-outs and shutdowns are not. Identical requests arriving together
 * share one computation. Results may thus be shared between callers: read them, never modify
 * them (today's callers: Nest's JSON serialisation; the study builder, which copies fields into
 * a new object). Not frozen: freezing every result deeply would cost more than it guards.
 */
@Injectable()
export class ComputeService implements OnModuleDestroy {
  private readonly logger = new Logger('Compute');
  private readonly pool: ComputePool;
  private readonly cache: LRUCache<string, ComputeOutcome> | undefined;
  private readonly inFlight = new Map<string, Promise<ComputeOutcome>>();
  private closing = false;

  constructor(
    @Inject(APP_CONFIG) config: AppConfig,
    private readonly profiles: ProfileLookup,
  ) {
    this.pool = new ComputePool({
      size: config.computeWorkers,
      timeoutMs: config.computeTimeoutMs,
      onError: (err) => this.logger.error(`compute worker failed: ${err.message}`),
    });
    if (config.computeCacheMb > 0) {
      this.cache = new LRUCache<string, ComputeOutcome>({
        maxSize: config.computeCacheMb * 1024 * 1024,
        // The worker measured the outcome's JSON (off the main thread); the key is a hash.
        sizeCalculation: (outcome, key) =>
          (outcome.size ?? JSON.stringify(outcome).length) + key.length,
      });
    }
  }

  /** One compute route. The result may be shared with other callers: do not modify it. */
  async run(route: ComputeRoute, body: unknown, user?: UserView): Promise<unknown> {
    const outcome = await this.compute(route, routeTask(route, this.withStoredProfile(body, user)));
    if (outcome.ok) return outcome.result;
    if (outcome.convergence) throw new ApiException(422, NO_CONVERGED_SOLUTION);
    if (outcome.status === 500) throw new Error(`${route}: ${outcome.internal ?? outcome.message}`);
    throw new ApiException(outcome.status, outcome.message, outcome.fields);
  }

  /**
   * The plan of common/src/conditions/plan.ts (errors as its computeErrorStatus maps them).
   * The result may be shared with other callers: do not modify it.
   */
  async plan(input: PlanTaskInput): Promise<PlanResponse> {
    const outcome = await this.compute('plan', planTask(input));
    if (outcome.ok) return outcome.result as PlanResponse;
    if (outcome.status === 500) throw new Error(`plan: ${outcome.internal ?? outcome.message}`);
    throw new ApiException(outcome.status, outcome.message, outcome.fields);
  }

  /** The cached or shared outcome of an equal task, else a new computation. */
  private compute(label: string, task: ComputeTask): Promise<ComputeOutcome> {
    if (this.closing) return Promise.reject(shuttingDown());
    const cache = this.cache;
    if (!cache) return this.dispatch(label, task);
    const key = `${label} ${createHash('sha256').update(task.json).digest('base64url')}`;
    const hit = cache.get(key);
    if (hit) return Promise.resolve(hit);
    let shared = this.inFlight.get(key);
    if (!shared) {
      shared = this.dispatch(label, { ...task, measure: true })
        .then((outcome) => {
          if (outcome.ok || outcome.status !== 500) cache.set(key, outcome);
          return outcome;
        })
        .finally(() => this.inFlight.delete(key));
      this.inFlight.set(key, shared);
    }
    return shared;
  }

  /** One computation in the pool; logs what the server log should know, once per computation. */
  private async dispatch(label: string, task: ComputeTask): Promise<ComputeOutcome> {
    let outcome: ComputeOutcome;
    try {
      outcome = await this.pool.run(task);
    } catch (err) {
      if (err instanceof ComputeTimeoutError) {
        this.logger.warn(`${label}: ${err.message}; body ${task.json.slice(0, 2000)}`);
        throw new ApiException(422, `No answer: the ${err.message}`);
      }
      if (err instanceof ComputePoolClosedError) throw shuttingDown();
      throw err;
    }
    if (!outcome.ok && outcome.convergence) this.logger.warn(`${label}: ${outcome.convergence}`);
    return outcome;
  }

  /** `{ profile: { id } }` → the stored profile's layers/samples, if this user may see it. */
  private withStoredProfile(body: unknown, user: UserView | undefined): unknown {
    if (typeof body !== 'object' || body === null) return body;
    const profile = (body as { profile?: unknown }).profile;
    if (typeof profile !== 'object' || profile === null) return body;
    const keys = Object.keys(profile);
    const id = (profile as { id?: unknown }).id;
    if (keys.length !== 1 || keys[0] !== 'id' || !Number.isSafeInteger(id) || (id as number) < 1) {
      return body; // not a plain stored-profile reference: the schema reports what is wrong
    }
    const stored = user ? this.profiles.resolveForUser(id as number, user) : undefined;
    if (!stored) {
      throw badRequest(`profile.id: no profile with id ${String(id)}`, {
        'profile.id': `no profile with id ${String(id)}`,
      });
    }
    return { ...body, profile: stored };
  }

  /**
   * Shutdown: new computations answer 503 at once; those already submitted get DRAIN_MS to
   * finish, then the workers stop and any still running answer 503 (one log line says how many).
   */
  async onModuleDestroy(): Promise<void> {
    this.closing = true;
    const cancelled = await this.pool.close(DRAIN_MS);
    this.cache?.clear();
    if (cancelled > 0) {
      this.logger.warn(
        `shutdown: ${cancelled} computation(s) still running after ${DRAIN_MS / 1000} s were stopped (answered 503)`,
      );
    }
  }
}
