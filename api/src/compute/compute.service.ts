import type { ComputeRoute, UserView } from '@hopwise/common';
import { Inject, Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { ApiException, badRequest } from '../http/api-error.js';
import { ProfileLookup } from '../profiles/profile-lookup.js';
import { ComputePool, ComputeTimeoutError } from './compute-pool.js';

export const NO_CONVERGED_SOLUTION = 'no converged solution';

/**
 * Runs the physics core (runCompute from common, in a worker thread) and maps its outcome to the
 * one error shape via computeErrorStatus: InputError → 400 with fields by dotted path,
 * NoSolutionError → 422, ConvergenceError → 422 (logged: ill-conditioning or a bug, not the user's
 * fault), over the time limit → 422. Unexpected errors are logged and become a generic 500.
 *
 * Stored profiles (`profile: { id }`) are resolved here, in the main thread, by replacing the id
 * with the stored layers/samples before dispatch (ProfileLookup: own, published, or any for an
 * admin); an id the user may not see answers 400 naming `profile.id`.
 */
@Injectable()
export class ComputeService implements OnModuleDestroy {
  private readonly logger = new Logger('Compute');
  private readonly pool: ComputePool;

  constructor(
    @Inject(APP_CONFIG) config: AppConfig,
    private readonly profiles: ProfileLookup,
  ) {
    this.pool = new ComputePool(config.computeWorkers, config.computeTimeoutMs);
  }

  async run(route: ComputeRoute, body: unknown, user?: UserView): Promise<unknown> {
    body = this.withStoredProfile(body, user);
    let outcome;
    try {
      outcome = await this.pool.run(route, body);
    } catch (err) {
      if (err instanceof ComputeTimeoutError) {
        this.logger.warn(`${route}: ${err.message}; body ${JSON.stringify(body).slice(0, 2000)}`);
        throw new ApiException(422, `No answer: the ${err.message}`);
      }
      throw err;
    }
    if (outcome.ok) return outcome.result;
    if (outcome.convergence) {
      this.logger.warn(`${route}: ${outcome.convergence}`);
      throw new ApiException(422, NO_CONVERGED_SOLUTION);
    }
    if (outcome.status === 500) throw new Error(`${route}: ${outcome.internal ?? outcome.message}`);
    throw new ApiException(outcome.status, outcome.message, outcome.fields);
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

  async onModuleDestroy(): Promise<void> {
    await this.pool.close();
  }
}
