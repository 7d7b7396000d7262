import { Duration } from 'luxon';
import { describe, expect, it } from 'vitest';
import { clockDigits, potLifeState } from './pot-life';

const start = Date.UTC(2026, 2, 1, 18, 0, 0);
const at = (minutes: number, seconds = 0) => start + (minutes * 60 + seconds) * 1000;

describe('potLifeState', () => {
  // Reference: luxon's Duration formats the same span of seconds as mm:ss / h:mm:ss.
  it('counts a 45 min pot life down in minutes and seconds', () => {
    const state = potLifeState(start, at(12, 30), 45);
    expect(state.remainingSeconds).toBe(Duration.fromObject({ minutes: 32, seconds: 30 }).as('seconds'));
    expect(state.digits).toBe(Duration.fromObject({ seconds: state.remainingSeconds }).toFormat('mm:ss'));
    expect(state.phase).toBe('running');
    expect(state.words).toBe('33 min of pot life left.');
  });

  it('shows hours for long pot lives', () => {
    const state = potLifeState(start, at(5), 90);
    expect(state.digits).toBe(Duration.fromObject({ minutes: 85 }).toFormat('h:mm:ss'));
  });

  it('turns to words with 5 minutes left', () => {
    expect(potLifeState(start, at(39, 59), 45).phase).toBe('running');
    const last = potLifeState(start, at(40), 45);
    expect(last.phase).toBe('last_minutes');
    expect(last.words).toMatch(/5 minutes or less/);
    expect(potLifeState(start, at(44, 30), 45).words).toMatch(/Under a minute/);
  });

  it('says the cup must not be poured once the time is up', () => {
    const over = potLifeState(start, at(45), 45);
    expect(over.phase).toBe('over');
    expect(over.digits).toBe('00:00');
    expect(over.words).toBe('Pot life over — do not pour this cup.');
    expect(potLifeState(start, at(80), 45).remainingSeconds).toBe(0);
  });

  it('never shows 00:00 while time is left', () => {
    expect(potLifeState(start, at(44, 59) + 400, 45).digits).toBe('00:01');
    expect(clockDigits(-5)).toBe('00:00');
  });
});
