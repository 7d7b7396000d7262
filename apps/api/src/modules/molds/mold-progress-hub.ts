import pg from 'pg';
import type { Logger } from 'pino';
import { MOLD_PROGRESS_CHANNEL } from '@gelpoint/db';
import type { MoldProgressEvent } from '@gelpoint/contracts';

/** One change of a mould's analysis, as the database announced it. */
export interface ProgressNote extends MoldProgressEvent {
  moldId: string;
}

/** Told each change of the mould it follows, or `lost` when the announcements stopped (the database went away). */
export type Follower = (note: ProgressNote | 'lost') => void;

interface Announcement {
  id: string;
  status: MoldProgressEvent['status'];
  progress: number;
  errorCode: string | null;
  errorMessage: string | null;
}

function noteOf(payload: string | undefined): ProgressNote | undefined {
  try {
    const a = JSON.parse(payload ?? '') as Announcement;
    if (typeof a.id !== 'string' || typeof a.status !== 'string' || typeof a.progress !== 'number') return undefined;
    return { moldId: a.id, status: a.status, progress: a.progress, error: a.errorCode ? { code: a.errorCode, message: a.errorMessage ?? '' } : null };
  } catch {
    return undefined;
  }
}

/**
 * This API instance's ear on the database's announcements of analysis progress (a trigger NOTIFYs every change,
 * whichever worker made it), shared by all the browsers this instance streams to. One LISTEN connection while
 * anyone follows a mould, none otherwise.
 */
export class MoldProgressHub {
  private connection: Promise<pg.Client> | undefined;
  private readonly followers = new Map<string, Set<Follower>>();
  private count = 0;

  constructor(
    private readonly databaseUrl: string,
    private readonly logger: Logger,
  ) {}

  /** Starts following a mould; resolves once the announcements are being heard, with the function that stops. */
  async follow(moldId: string, follower: Follower): Promise<() => void> {
    let set = this.followers.get(moldId);
    if (!set) this.followers.set(moldId, (set = new Set()));
    set.add(follower);
    this.count++;
    let stopped = false;
    const stop = () => {
      if (stopped) return;
      stopped = true;
      set.delete(follower);
      if (set.size === 0 && this.followers.get(moldId) === set) this.followers.delete(moldId);
      if (--this.count === 0) this.disconnect();
    };
    try {
      await (this.connection ??= this.connect());
    } catch (err) {
      stop();
      throw err;
    }
    return stop;
  }

  private async connect(): Promise<pg.Client> {
    const client = new pg.Client({ connectionString: this.databaseUrl, application_name: 'gelpoint-api-progress' });
    const attempt = (async () => {
      client.on('notification', (n) => {
        const note = noteOf(n.payload);
        if (!note) return;
        for (const f of this.followers.get(note.moldId) ?? []) f(note);
      });
      client.on('error', (err) => {
        this.logger.warn({ err: err.message }, 'analysis progress connection lost; the streams following it end, browsers reconnect');
        this.lose(attempt);
      });
      await client.connect();
      await client.query(`LISTEN ${MOLD_PROGRESS_CHANNEL}`);
      return client;
    })();
    attempt.catch(() => {
      this.lose(attempt);
      client.end().catch(() => undefined);
    });
    return attempt;
  }

  /** The connection failed: everyone following is told, and the next follower connects afresh. */
  private lose(connection: Promise<pg.Client>): void {
    if (this.connection !== connection) return;
    this.connection = undefined;
    void connection.then((c) => c.end()).catch(() => undefined);
    for (const set of this.followers.values()) for (const f of set) f('lost');
  }

  private disconnect(): void {
    const c = this.connection;
    this.connection = undefined;
    void c?.then((client) => client.end()).catch(() => undefined);
  }

  /** Ends every stream (they are told `lost`, so browsers reconnect elsewhere) and the connection: for a shutdown. */
  close(): void {
    const everyone = [...this.followers.values()].flatMap((s) => [...s]);
    for (const f of everyone) f('lost');
    this.disconnect();
  }
}
