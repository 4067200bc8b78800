import { ValidationError } from 'class-validator';
import { describe, expect, it } from 'vitest';
import { flattenValidationErrors, validationException } from './validation.js';

function err(
  property: string,
  constraints?: Record<string, string>,
  children: ValidationError[] = [],
  missing = false,
) {
  const e = new ValidationError();
  e.property = property;
  e.constraints = constraints;
  e.children = children;
  e.value = missing ? undefined : 'x';
  return e;
}

describe('flattenValidationErrors', () => {
  it('dots nested paths and brackets array indices', () => {
    const tree = [
      err('profile', undefined, [
        err('layers', undefined, [
          err('1', undefined, [err('name', { isString: 'name must be a string' })]),
        ]),
      ]),
      err('role', { isIn: 'role must be one of: a, b' }),
    ];
    expect(flattenValidationErrors(tree)).toEqual({
      'profile.layers[1].name': 'profile.layers[1].name must be a string',
      role: 'role must be one of: a, b',
    });
  });

  it('says "is required" for a missing value, but names unknown properties as such', () => {
    const tree = [
      err('email', { isEmail: 'email must be an e-mail address' }, [], true),
      err('extra', { whitelistValidation: 'property extra should not exist' }, [], true),
    ];
    expect(flattenValidationErrors(tree)).toEqual({
      email: 'email is required',
      extra: 'property extra should not exist',
    });
  });

  it('builds a 400 in the one error shape whose message names the fields', () => {
    const ex = validationException([err('role', { isIn: 'role must be one of: a, b' })]);
    expect(ex.getStatus()).toBe(400);
    expect(ex.getResponse()).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Invalid request: role must be one of: a, b',
      fields: { role: 'role must be one of: a, b' },
    });
  });
});
