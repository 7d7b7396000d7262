export const minuteMs = 60_000;
export const hourMs = 60 * minuteMs;

/** A span in the two largest units that matter on a shop floor: "3 h 20 min", "2 d 4 h", "45 min". */
export function spanWords(ms: number): string {
  const minutes = Math.round(Math.abs(ms) / minuteMs);
  if (minutes < 60) return `${minutes} min`;
  const totalHours = Math.floor(minutes / 60);
  if (totalHours < 24) {
    const rest = minutes % 60;
    return rest === 0 ? `${totalHours} h` : `${totalHours} h ${rest} min`;
  }
  const days = Math.floor(Math.round(Math.abs(ms) / hourMs) / 24);
  const hours = Math.round(Math.abs(ms) / hourMs) % 24;
  return hours === 0 ? `${days} d` : `${days} d ${hours} h`;
}

/** "in 3 h 20 min", "2 h ago", or "now" within half a minute either way. */
export function relativeWords(atMs: number, nowMs: number): string {
  const diff = atMs - nowMs;
  if (Math.abs(diff) < minuteMs / 2) return 'now';
  return diff > 0 ? `in ${spanWords(diff)}` : `${spanWords(diff)} ago`;
}

export function isOverdue(atMs: number, nowMs: number): boolean {
  return atMs < nowMs;
}
