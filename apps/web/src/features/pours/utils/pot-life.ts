/** From here on the clock says so in words as well as digits. */
export const potLifeWarningSeconds = 5 * 60;

export type PotLifePhase = 'running' | 'last_minutes' | 'over';

export interface PotLifeState {
  /** Whole seconds left, never below zero. */
  remainingSeconds: number;
  phase: PotLifePhase;
  /** "mm:ss", or "h:mm:ss" for pot lives of an hour or more. */
  digits: string;
  /** The sentence that goes with the phase. */
  words: string;
}

const pad = (n: number) => String(n).padStart(2, '0');

export function clockDigits(seconds: number): string {
  const whole = Math.max(0, Math.floor(seconds));
  const h = Math.floor(whole / 3600);
  const m = Math.floor((whole % 3600) / 60);
  const s = whole % 60;
  return h > 0 ? `${h}:${pad(m)}:${pad(s)}` : `${pad(m)}:${pad(s)}`;
}

/**
 * Where one cup's pot life stands, counted from the moment mixing started. Rounded up to the next whole second so
 * the digits reach 00:00 exactly when the time is over, never a second before.
 */
export function potLifeState(startedAtMs: number, nowMs: number, potLifeMin: number): PotLifeState {
  const remainingMs = startedAtMs + potLifeMin * 60_000 - nowMs;
  const remainingSeconds = Math.max(0, Math.ceil(remainingMs / 1000));
  if (remainingMs <= 0) {
    return { remainingSeconds: 0, phase: 'over', digits: clockDigits(0), words: 'Pot life over — do not pour this cup.' };
  }
  if (remainingSeconds <= potLifeWarningSeconds) {
    const minutes = Math.ceil(remainingSeconds / 60);
    return {
      remainingSeconds,
      phase: 'last_minutes',
      digits: clockDigits(remainingSeconds),
      words: `${minutes === 1 ? 'Under a minute' : `${minutes} minutes or less`} of pot life left — pour this cup now.`,
    };
  }
  return { remainingSeconds, phase: 'running', digits: clockDigits(remainingSeconds), words: `${Math.ceil(remainingSeconds / 60)} min of pot life left.` };
}
