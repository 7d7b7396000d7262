import type { Worker } from 'node:worker_threads';
import { defaultArchiveLimits, type FileUnits, type MouldFormat, type StoredAnalysisJson, type UpAxis } from '@gelpoint/mesh';
import { tsWorker } from '../../ts-worker';

/** What reading an upload found: its format, triangles and (3MF) the unit it states, or the reader's refusal. */
export type StlCheck =
  { ok: true; triangles: number; format: MouldFormat; fileUnits: FileUnits | null } | { ok: false; error: { code: string; message: string } };

/** An upload's analysis, made while it was stored, with the reading it was made for; null when the worker is to make it. */
export type UploadAnalysis = (StoredAnalysisJson & { units: FileUnits; up: UpAxis }) | null;

/** The reading an upload is to be analysed in: the maker's units (null: the file's own, else mm) and up axis. */
export interface AnalyseAs {
  units: FileUnits | null;
  up: UpAxis;
}

export interface CheckRequest {
  id: number;
  bytes: Uint8Array;
  maxTriangles: number;
  maxUnpackedBytes: number;
  analyse?: AnalyseAs;
}
export type CheckReply = StlCheck & { id: number; kind: 'check' };
export interface AnalysisReply {
  id: number;
  kind: 'analysis';
  analysis: UploadAnalysis;
}

/** A check under way, and the analysis that follows it when one was asked for. */
export interface CheckUnderWay {
  check: Promise<StlCheck>;
  analysis: Promise<UploadAnalysis>;
}

/**
 * One long-lived thread that reads uploads (STL, 3MF or OBJ) to check them, so a bad file is refused at once with the
 * parser's sentence while the event loop keeps serving others, and (when asked) analyses them while they are stored.
 * Requests queue in order.
 */
export class StlChecker {
  private worker?: Worker;
  private nextId = 1;
  private readonly checks = new Map<number, (r: StlCheck) => void>();
  private readonly analyses = new Map<number, (r: UploadAnalysis) => void>();

  constructor(
    private readonly maxTriangles: number,
    private readonly maxUnpackedBytes = defaultArchiveLimits.maxPartBytes,
  ) {}

  private thread(): Worker {
    if (this.worker) return this.worker;
    const w = tsWorker(new URL('./stl-check.thread.ts', import.meta.url));
    w.on('message', (m: CheckReply | AnalysisReply) => {
      if (m.kind === 'analysis') {
        this.analyses.get(m.id)?.(m.analysis);
        this.analyses.delete(m.id);
        return;
      }
      this.checks.get(m.id)?.(m);
      this.checks.delete(m.id);
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
    for (const resolve of this.checks.values()) resolve({ ok: false, error: { code: 'file_check_failed', message } });
    this.checks.clear();
    // An analysis that will not come is the worker's to make.
    for (const resolve of this.analyses.values()) resolve(null);
    this.analyses.clear();
  }

  /** Starts the thread if it is not running, so it is ready by the time an upload that is still arriving is in. */
  warm(): void {
    this.thread();
  }

  /**
   * Checks the upload and, given a reading, then analyses it in that reading; the analysis is null when none was
   * asked for or the file was refused.
   */
  check(bytes: Uint8Array, analyse?: AnalyseAs): CheckUnderWay {
    const id = this.nextId++;
    const check = new Promise<StlCheck>((resolve) => this.checks.set(id, resolve));
    const analysis = analyse ? new Promise<UploadAnalysis>((resolve) => this.analyses.set(id, resolve)) : Promise.resolve(null);
    // An upload read into shared memory is read by the thread in place while the request stores it; any other
    // buffer goes as a copy, since the request keeps its own.
    const shared = bytes.buffer instanceof SharedArrayBuffer ? bytes : new Uint8Array(bytes);
    const request: CheckRequest = {
      id,
      bytes: shared,
      maxTriangles: this.maxTriangles,
      maxUnpackedBytes: this.maxUnpackedBytes,
      ...(analyse ? { analyse } : {}),
    };
    this.thread().postMessage(request);
    return { check, analysis };
  }

  async close(): Promise<void> {
    await this.worker?.terminate();
  }
}
