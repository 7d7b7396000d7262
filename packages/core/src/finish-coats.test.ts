import { describe, expect, it } from 'vitest';
import { finishCoatSchedule } from './finish-coats';

describe('finish coats after machining', () => {
  it('spaces coats by the interval, first coat at machining', () => {
    const schedule = finishCoatSchedule({ machinedAt: '2025-02-10T09:00:00Z', coats: 3, hoursBetweenCoats: 6 });
    expect(schedule).toEqual({
      ok: true,
      value: [
        { coat: 1, dueAt: '2025-02-10T09:00:00Z' },
        { coat: 2, dueAt: '2025-02-10T15:00:00Z' },
        { coat: 3, dueAt: '2025-02-10T21:00:00Z' },
      ],
    });
    expect(finishCoatSchedule({ machinedAt: '2025-02-10T09:00:00Z', coats: 0, hoursBetweenCoats: 6 }).ok).toBe(false);
    const local = finishCoatSchedule({ machinedAt: '2025-07-01T08:00:00+02:00', coats: 2, hoursBetweenCoats: 12, zone: 'Europe/Berlin' });
    expect(local.ok && local.value.map((c) => c.dueAt)).toEqual(['2025-07-01T08:00:00+02:00', '2025-07-01T20:00:00+02:00']);
  });
});
