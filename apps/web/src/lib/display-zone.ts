/**
 * The zone every time on screen is shown in: the shop's own (a shop lives in one place, whoever looks at it from
 * wherever). Set once the signed-in session is known; before that, the browser's own.
 */
let zone: string | undefined;
const listeners = new Set<() => void>();

export function setDisplayTimeZone(next: string | undefined): void {
  if (next === zone) return;
  zone = next;
  for (const listener of listeners) listener();
}

export function displayTimeZone(): string | undefined {
  return zone;
}

export function onDisplayTimeZoneChange(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
