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
  type ComputeReply,
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
 * kept as their JSON text (LRU, bounded by that text's length, HOPWISE_COMPUTE_CACHE_MB); 500s,
 * time-outs and shutdowns are not. Identical requests arriving together share one computation.
 * Every caller parses its own copy, so no caller can change what another one gets.
 */
@Injectable()
export class ComputeService implements OnModuleDestroy {
  private readonly logger = new Logger('Compute');
  private readonly pool: ComputePool;
  private readonly cache: LRUCache<string, string> | undefined;
  private readonly inFlight = new Map<string, Promise<string>>();
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
      this.cache = new LRUCache<string, string>({
        maxSize: config.computeCacheMb * 1024 * 1024,
        // Outcomes are kept as their JSON text (one byte per character for ASCII): the bound is
        // close to the memory they take, unlike parsed objects (several times their JSON size).
        sizeCalculation: (json, key) => json.length + key.length,
      });
    }
  }

  /** One compute route. */
  async run(route: ComputeRoute, body: unknown, user?: UserView): Promise<unknown> {
    const outcome = await this.compute(route, routeTask(route, this.withStoredProfile(body, user)));
    if (outcome.ok) return outcome.result;
    if (outcome.convergence) throw new ApiException(422, NO_CONVERGED_SOLUTION);
    if (outcome.status === 500) throw new Error(`${route}: ${outcome.internal ?? outcome.message}`);
    throw new ApiException(outcome.status, outcome.message, outcome.fields);
  }

  /**
   * The plan of common/src/conditions/plan.ts (errors as its computeErrorStatus maps them).
   */
  async plan(input: PlanTaskInput): Promise<PlanResponse> {
    const outcome = await this.compute('plan', planTask(input));
    if (outcome.ok) return outcome.result as PlanResponse;
    if (outcome.status === 500) throw new Error(`plan: ${outcome.internal ?? outcome.message}`);
    throw new ApiException(outcome.status, outcome.message, outcome.fields);
  }

  /** The cached or shared outcome of an equal task, else a new computation. */
  private async compute(label: string, task: ComputeTask): Promise<ComputeOutcome> {
    if (this.closing) throw shuttingDown();
    const cache = this.cache;
    if (!cache) return this.outcomeOf(label, await this.dispatch(label, task));
    const key = `${label} ${createHash('sha256').update(task.json).digest('base64url')}`;
    const hit = cache.get(key);
    if (hit !== undefined) return JSON.parse(hit) as ComputeOutcome;
    const shared = this.inFlight.get(key);
    // Each caller parses its own copy: nobody can change what another caller gets.
    if (shared) return JSON.parse(await shared) as ComputeOutcome;
    let first!: ComputeOutcome;
    const computing = this.dispatch(label, { ...task, serialize: true })
      .then((reply) => {
        const json = typeof reply === 'string' ? reply : JSON.stringify(reply);
        first = this.outcomeOf(label, json); // the first caller's copy
        if (first.ok || first.status !== 500) cache.set(key, json);
        return json;
      })
      .finally(() => this.inFlight.delete(key));
    this.inFlight.set(key, computing);
    await computing;
    return first;
  }

  /** The outcome of a reply; logs a convergence failure (once per computation, not per caller). */
  private outcomeOf(label: string, reply: ComputeReply): ComputeOutcome {
    const outcome = typeof reply === 'string' ? (JSON.parse(reply) as ComputeOutcome) : reply;
    if (!outcome.ok && outcome.convergence) {
      this.logger.warn(`${label}: ${outcome.convergence}`);
    }
    return outcome;
  }

  /** One computation in the pool (time-outs and shutdown mapped to the API's answers). */
  private async dispatch(label: string, task: ComputeTask): Promise<ComputeReply> {
    try {
      return await this.pool.run(task);
    } catch (err) {
      if (err instanceof ComputeTimeoutError) {
        this.logger.warn(`${label}: ${err.message}; body ${task.json.slice(0, 2000)}`);
        throw new ApiException(422, `No answer: the ${err.message}`);
      }
      if (err instanceof ComputePoolClosedError) throw shuttingDown();
      throw err;
    }
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
