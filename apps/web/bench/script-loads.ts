import { gzipSync } from 'node:zlib';
import type { Page, Response } from 'playwright-core';

/** One JavaScript file the browser fetched, with its size as sent and as gzip would send it. */
export interface ScriptLoad {
  /** The file name under /assets, e.g. `index-Cue4qyPw.js`. */
  name: string;
  rawBytes: number;
  gzipBytes: number;
  /** three.js announces itself by setting `__THREE__` on the window; only its chunk carries the name. */
  isThree: boolean;
}

export interface ScriptRecorder {
  /** Every script answered since the recorder started, once all their bodies are read. */
  loads(): Promise<ScriptLoad[]>;
  stop(): void;
}

const isScript = (r: Response) => r.request().resourceType() === 'script' || /javascript/.test(r.headers()['content-type'] ?? '');

/**
 * Records the JavaScript a page fetches from the network. Playwright hands over each body decoded,
 * whichever of its precompressed forms the API sent (apps/api/src/http/static-web.ts), so the gzip
 * size is computed here from each body with node:zlib at its default level: a figure that stays
 * comparable from run to run whatever the browser negotiated.
 */
export function recordScripts(page: Page): ScriptRecorder {
  const pending: Promise<ScriptLoad | null>[] = [];
  const onResponse = (r: Response) => {
    if (!isScript(r) || r.status() !== 200) return;
    pending.push(
      r.body().then(
        (body) => ({
          name: new URL(r.url()).pathname.split('/').pop() ?? r.url(),
          rawBytes: body.byteLength,
          gzipBytes: gzipSync(body).byteLength,
          isThree: body.includes('__THREE__'),
        }),
        () => null,
      ),
    );
  };
  page.on('response', onResponse);
  return {
    loads: async () => (await Promise.all(pending)).filter((l): l is ScriptLoad => l !== null),
    stop: () => page.off('response', onResponse),
  };
}

export function totalGzipBytes(loads: readonly ScriptLoad[]): number {
  return loads.reduce((sum, l) => sum + l.gzipBytes, 0);
}

export function totalRawBytes(loads: readonly ScriptLoad[]): number {
  return loads.reduce((sum, l) => sum + l.rawBytes, 0);
}
