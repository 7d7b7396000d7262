import { QueryFailedError } from 'typeorm';
import { describe, expect, it } from 'vitest';
import { toAppError } from './errors';

// SQLSTATE codes from the PostgreSQL 15 manual, Appendix A "PostgreSQL Error Codes".
const pgError = (code: string) => Object.assign(new Error('from the server'), { code });

describe('database refusals that are the caller’s input', () => {
  it('answers NUL in text (22021, 22P05) with a 400 that says to remove it', () => {
    for (const code of ['22021', '22P05']) {
      const e = toAppError(pgError(code));
      expect(e?.status).toBe(400);
      expect(e?.code).toBe('invalid_text');
    }
  });

  it('answers numbers and times past a column’s range (22003, 22008, 22009) with a 400, also through TypeORM', () => {
    for (const err of [pgError('22003'), pgError('22008'), new QueryFailedError('INSERT …', [], pgError('22009'))]) {
      const e = toAppError(err);
      expect(e?.status).toBe(400);
      expect(e?.code).toBe('value_out_of_range');
      expect(e?.message).toMatch(/year/);
    }
  });

  it('answers a unique clash from two requests at once (23505) with a 409', () => {
    expect(toAppError(pgError('23505'))?.status).toBe(409);
  });

  it('leaves other database errors to the 500 handler', () => {
    expect(toAppError(pgError('42P01'))).toBeUndefined();
    expect(toAppError(new Error('boom'))).toBeUndefined();
  });
});
