import type { Worker } from 'node:worker_threads';
import { defaultArchiveLimits, type FileUnits, type MouldFormat } from '@gelpoint/mesh';
import { tsWorker } from '../../ts-worker';

/** What reading an upload found: its format, triangles and (3MF) the unit it states, or the reader's refusal. */
export type StlCheck =
  { ok: true; triangles: number; format: MouldFormat; fileUnits: FileUnits | null } | { ok: false; error: { code: string; message: string } };

/**
 * One long-lived thread that reads uploads (STL, 3MF or OBJ) to check them, so a bad file is refused at once with the
 * parser's sentence while the event loop keeps serving others. Requests queue in order.
 */
export class StlChecker {
  private worker?: Worker;
  private nextId = 1;
  private readonly waiting = new Map<number, (r: StlCheck) => void>();

  constructor(
    private readonly maxTriangles: number,
    private readonly maxUnpackedBytes = defaultArchiveLimits.maxPartBytes,
  ) {}

  private thread(): Worker {
    if (this.worker) return this.worker;
    const w = tsWorker(new URL('./stl-check.thread.ts', import.meta.url));
    w.on('message', (m: StlCheck & { id: number }) => {
      this.waiting.get(m.id)?.(m);
      this.waiting.delete(m.id);
    });
    w.on('error', () => this.fail('the file could not be checked; send it again'));
    w.on('exit', () => {
      if (this.worker === w) this.worker = undefined;
      this.fail('the file check stopped; send it again');
    });
    w.unref();
    this.worker = w;
    return w;
  }

  private fail(message: string) {
    for (const resolve of this.waiting.values()) resolve({ ok: false, error: { code: 'file_check_failed', message } });
    this.waiting.clear();
  }

  /** Starts the thread if it is not running, so it is ready by the time an upload that is still arriving is in. */
  warm(): void {
    this.thread();
  }

  check(bytes: Uint8Array): Promise<StlCheck> {
    const id = this.nextId++;
    return new Promise((resolve) => {
      this.waiting.set(id, resolve);
      // An upload read into shared memory is read by the thread in place while the request stores it; any other
      // buffer goes as a copy, since the request keeps its own.
      const shared = bytes.buffer instanceof SharedArrayBuffer ? bytes : new Uint8Array(bytes);
      this.thread().postMessage({ id, bytes: shared, maxTriangles: this.maxTriangles, maxUnpackedBytes: this.maxUnpackedBytes });
    });
  }

  async close(): Promise<void> {
    await this.worker?.terminate();
  }
}
