import { describe, expect, it } from 'vitest';
import { ApiError } from './api-error';
import { applyServerErrors, splitFieldErrors } from './form-errors';

describe('splitFieldErrors', () => {
  it('keeps messages for shown fields and collects the rest', () => {
    const split = splitFieldErrors({ email: 'email must look like name@example.com', shopId: 'must be an id (a UUID)' }, ['email', 'password'] as const);
    expect(split.byField).toEqual({ email: 'email must look like name@example.com' });
    expect(split.other).toEqual(['must be an id (a UUID)']);
  });
});

describe('applyServerErrors', () => {
  it('sets field errors, focusing only the first, and needs no form-level alert', () => {
    const calls: Array<[string, string, boolean | undefined]> = [];
    const error = new ApiError(400, 'invalid_input', 'Check the form.', {
      password: 'password must be at least 8 characters',
      email: 'email must look like name@example.com',
    });
    const rest = applyServerErrors(error, (name, e, options) => calls.push([name, e.message, options?.shouldFocus]), ['email', 'password'] as const);
    expect(rest).toBeNull();
    expect(calls).toEqual([
      ['email', 'email must look like name@example.com', true],
      ['password', 'password must be at least 8 characters', false],
    ]);
  });

  it('returns the message when no field is named', () => {
    const error = new ApiError(401, 'invalid_credentials', 'That e-mail and password do not match.');
    expect(applyServerErrors(error, () => undefined, ['email'] as const)).toBe('That e-mail and password do not match.');
  });

  it('adds messages about hidden fields to the form-level message', () => {
    const error = new ApiError(400, 'invalid_input', 'Check the form.', { shopId: 'must be an id (a UUID)' });
    expect(applyServerErrors(error, () => undefined, ['email'] as const)).toBe('Check the form. must be an id (a UUID)');
  });
});
