import { ValidationPipe, type ValidationError } from '@nestjs/common';
import { ApiException } from './api-error.js';

/** `items[0].name` for array indices, `a.b` for nested objects. */
function childPath(parent: string, property: string): string {
  if (/^\d+$/.test(property)) return `${parent}[${property}]`;
  return parent ? `${parent}.${property}` : property;
}

/** Flattens class-validator's tree into `{ 'dotted.path': 'first reason' }`. */
export function flattenValidationErrors(
  errors: ValidationError[],
  parent = '',
  out: Record<string, string> = {},
): Record<string, string> {
  for (const e of errors) {
    const path = childPath(parent, e.property);
    const constraints = e.constraints ?? {};
    const reasons = Object.values(constraints);
    if (e.value === undefined && reasons.length > 0 && !('whitelistValidation' in constraints)) {
      out[path] = `${path} is required`;
    } else if (reasons.length > 0) {
      // class-validator phrases start with the bare property name; show the full path instead.
      const first = reasons[0];
      out[path] = first.startsWith(`${e.property} `)
        ? `${path}${first.slice(e.property.length)}`
        : first;
    }
    if (e.children?.length) flattenValidationErrors(e.children, path, out);
  }
  return out;
}

export function validationException(errors: ValidationError[]): ApiException {
  const fields = flattenValidationErrors(errors);
  const names = Object.keys(fields);
  const message =
    names.length > 0
      ? `Invalid request: ${names.map((n) => fields[n]).join('; ')}`
      : 'Invalid request';
  return new ApiException(400, message, fields);
}

/** The one global pipe: unknown properties are refused, payloads become DTO instances. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    // `value` is kept for the "is required" check above; it never reaches the response.
    validationError: { target: false, value: true },
    exceptionFactory: validationException,
  });
}
