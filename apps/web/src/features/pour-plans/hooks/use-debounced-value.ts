import { useEffect, useRef, useState } from 'react';

/**
 * The value as it was once `key` stopped changing for `delayMs`: the live numbers follow the typing without
 * recomputing on every keystroke. `key` says when the value really changed (a form hands over a new object each time).
 */
export function useDebouncedValue<T>(value: T, key: string, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  const latest = useRef(value);
  latest.current = value;
  useEffect(() => {
    const timer = setTimeout(() => setSettled(latest.current), delayMs);
    return () => clearTimeout(timer);
  }, [key, delayMs]);
  return settled;
}
