import { describe, expect, it } from 'vitest';
import { ApiError } from './api-error';
import { errorNotice } from './error-notice';

describe('errorNotice', () => {
  it('says plainly that the role is the reason for a 403', () => {
    const notice = errorNotice(new ApiError(403, 'forbidden', 'Only a shop lead can delete pieces.'));
    expect(notice).toEqual({ title: "Your role can't do this", message: 'Only a shop lead can delete pieces.' });
  });

  it('passes the server sentence through for a validation error', () => {
    const notice = errorNotice(new ApiError(422, 'invalid_input', 'name is required'));
    expect(notice.message).toBe('name is required');
  });

  it('calls an unreached server a connection problem', () => {
    expect(errorNotice(new ApiError(0, 'network_unreachable', 'x')).title).toBe('No connection');
  });

  it('does not leak the text of an unexpected exception', () => {
    const notice = errorNotice(new TypeError('cannot read properties of undefined'));
    expect(notice.message).not.toMatch(/undefined/);
    expect(notice.title).toBe('Something went wrong');
  });
});
