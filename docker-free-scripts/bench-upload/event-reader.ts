/** One Server-Sent Event as it arrived, with its time from the given start. */
export interface TimedEvent {
  event: string;
  data: string;
  status?: string;
  progress?: number;
  atMs: number;
}

/**
 * Reads an event stream to its end (or until `timeoutMs`), noting when each event arrived: the HTML standard's
 * format, in the subset the API sends (`event:` and `data:` lines, comments, `retry:`).
 */
export async function readEvents(url: string, headers: Record<string, string>, startedAt: number, timeoutMs: number): Promise<TimedEvent[]> {
  const res = await fetch(url, { headers, signal: AbortSignal.timeout(timeoutMs) });
  if (res.status !== 200 || !res.body) throw new Error(`the event stream answered ${res.status}`);
  const events: TimedEvent[] = [];
  let pending = '';
  const decoder = new TextDecoder();
  for await (const chunk of res.body as unknown as AsyncIterable<Uint8Array>) {
    const at = performance.now() - startedAt;
    pending += decoder.decode(chunk, { stream: true });
    let end: number;
    while ((end = pending.indexOf('\n\n')) >= 0) {
      const block = pending.slice(0, end).split('\n');
      pending = pending.slice(end + 2);
      const event = block.find((l) => l.startsWith('event: '))?.slice(7);
      const data = block.find((l) => l.startsWith('data: '))?.slice(6);
      if (!event || data === undefined) continue;
      const parsed = JSON.parse(data) as { status?: string; progress?: number };
      events.push({ event, data, status: parsed.status, progress: parsed.progress, atMs: at });
    }
  }
  return events;
}
