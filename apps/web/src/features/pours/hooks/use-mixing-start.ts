import { useCallback, useState } from 'react';

const storageKey = (pourId: string, planBatchIndex: number) => `gelpoint:mixing-started:${pourId}:${planBatchIndex}`;

function read(key: string): number | null {
  try {
    const stored = window.localStorage.getItem(key);
    const ms = stored === null ? Number.NaN : Number(stored);
    return Number.isFinite(ms) ? ms : null;
  } catch {
    return null;
  }
}

function write(key: string, ms: number | null): void {
  try {
    if (ms === null) window.localStorage.removeItem(key);
    else window.localStorage.setItem(key, String(ms));
  } catch {
    // Private browsing may refuse storage; the clock still runs for as long as the page is open.
  }
}

/**
 * When mixing of one cup started, kept on this device so a reload or a locked tablet does not lose the pot-life
 * clock of a cup that is already mixed.
 */
export function useMixingStart(pourId: string, planBatchIndex: number) {
  const key = storageKey(pourId, planBatchIndex);
  const [startedAtMs, setStartedAtMs] = useState<number | null>(() => read(key));
  const start = useCallback(() => {
    const now = Date.now();
    write(key, now);
    setStartedAtMs(now);
  }, [key]);
  const clear = useCallback(() => {
    write(key, null);
    setStartedAtMs(null);
  }, [key]);
  return { startedAtMs, start, clear };
}
