import { describe, expect, it } from 'vitest';
import { evidenceWords } from './cure-evidence';

describe('what a cure rests on, in words', () => {
  const base = { pouredAt: '2026-03-01T00:00:00Z', gaps: [] as { from: string; to: string; hours: number; tempC: number }[] };

  it('says when everything comes from readings', () => {
    expect(evidenceWords({ ...base, equivalentHoursAtRef: 30, loggedEquivalentHours: 30, assumedEquivalentHours: 0 })?.basis).toBe(
      'Cure: 30 h of 30 h logged, all of it from readings.',
    );
  });

  it('names the gaps and flags a cure that mostly rests on them', () => {
    const gap = { from: '2026-03-01T02:00:00Z', to: '2026-03-02T00:00:00Z', hours: 22, tempC: 15 };
    const words = evidenceWords({ ...base, gaps: [gap], equivalentHoursAtRef: 20, loggedEquivalentHours: 4, assumedEquivalentHours: 16 });
    expect(words?.basis).toBe('Cure: 4.0 h of 20 h logged; 16 h counted across 1 gap in the log at the lower temperature.');
    expect(words?.mostlyAssumed).toBe(true);
  });

  it('says so when nothing has been logged, and says nothing before the pour', () => {
    expect(evidenceWords({ ...base, equivalentHoursAtRef: 12, loggedEquivalentHours: 0, assumedEquivalentHours: 12 })?.mostlyAssumed).toBe(true);
    expect(evidenceWords({ ...base, pouredAt: null, equivalentHoursAtRef: 0, loggedEquivalentHours: 0, assumedEquivalentHours: 0 })).toBeNull();
  });
});
