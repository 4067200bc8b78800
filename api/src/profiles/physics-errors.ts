import { computeErrorStatus } from '@hopwise/common';
import { ApiException } from '../http/api-error.js';

/**
 * Maps an error of the physics core to the one error shape: InputError → 400 naming the field,
 * NoSolutionError and ConvergenceError → 422 (common's computeErrorStatus). Anything else is a
 * bug and is rethrown (a logged 500).
 */
export function rethrowPhysicsError(err: unknown, unprocessablePrefix = ''): never {
  const mapped = computeErrorStatus(err);
  if (mapped.status === 500) throw err;
  if (mapped.status === 422) {
    throw new ApiException(422, `${unprocessablePrefix}${mapped.message}`, mapped.fields);
  }
  throw new ApiException(mapped.status, mapped.message, mapped.fields);
}
