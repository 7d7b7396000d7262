import { describe, expect, it } from 'vitest';
import { plausibleRange, readingTimeRefusal, temperatureConcerns, weightConcerns } from './log-guards';

const range = plausibleRange({ minWorkTempC: 18, maxWorkTempC: 29 });

describe('questions a log asks before it believes a reading', () => {
  it('takes the working range widened by 10 K without a question', () => {
    expect(range).toEqual({ minC: 8, maxC: 39 });
    expect(temperatureConcerns(8, range)).toEqual([]);
    expect(temperatureConcerns(39, range)).toEqual([]);
  });

  it('asks whether 70 typed as °C was meant as °F', () => {
    // NIST SP 811: t/°C = (t/°F − 32)/1.8, so 70 °F = 21.1 °C.
    const [concern] = temperatureConcerns(70, range);
    expect(concern?.code).toBe('reading_looks_fahrenheit');
    expect(concern?.suggestedTempC).toBe(21.1);
    expect(concern?.message).toContain('did you mean °F?');
  });

  it('questions a value that is neither, naming the range', () => {
    const [concern] = temperatureConcerns(150, range);
    expect(concern?.code).toBe('reading_out_of_range');
    expect(concern?.message).toContain('8 to 39 °C');
    expect(temperatureConcerns(-5, range)[0]?.code).toBe('reading_out_of_range');
  });

  it('refuses times in the future (beyond 10 min) and before the pour', () => {
    const now = Date.UTC(2026, 11, 4, 12);
    const started = Date.UTC(2026, 11, 4, 8);
    expect(readingTimeRefusal(now + 9 * 60_000, { pourStartedMs: started, nowMs: now })).toBeNull();
    expect(readingTimeRefusal(now + 11 * 60_000, { pourStartedMs: started, nowMs: now })).toMatch(/in the future/);
    expect(readingTimeRefusal(Date.UTC(2030, 0, 1), { pourStartedMs: started, nowMs: now })).toMatch(/in the future/);
    expect(readingTimeRefusal(started - 9 * 60_000, { pourStartedMs: started, nowMs: now })).toBeNull();
    expect(readingTimeRefusal(started - 11 * 60_000, { pourStartedMs: started, nowMs: now })).toMatch(/before this pour started/);
  });

  it('questions a weighed part more than half its target away', () => {
    expect(weightConcerns([{ field: 'weighedAG', label: 'Part A', weighedG: 51, targetG: 34 }])).toEqual([]);
    const [concern] = weightConcerns([{ field: 'weighedAG', label: 'Part A', weighedG: 99_999, targetG: 34.4 }]);
    expect(concern?.field).toBe('weighedAG');
    expect(concern?.message).toMatch(/^Part A weighed 99999 g against a target of 34.4 g/);
    expect(weightConcerns([{ field: 'weighedPigmentG', label: 'Pigment', weighedG: 0, targetG: 5 }])[0]?.code).toBe('weight_far_from_target');
  });
});
