import { parentPort } from 'node:worker_threads';
import {
  analyzeCavity,
  archiveLimitsFor,
  prepareMesh,
  readMouldFile,
  storedAnalysisJson,
  type FileUnits,
  type StoredAnalysisJson,
  type UpAxis,
} from '@gelpoint/mesh';

export interface AnalysisRequest {
  bytes: Uint8Array;
  units: FileUnits;
  up: UpAxis;
  maxTriangles: number;
  maxUnpackedBytes: number;
}

export type AnalysisMessage =
  | { type: 'progress'; value: number }
  /** As JSON text, written in the thread: the worker's event loop only passes the strings on to the database. */
  | ({ type: 'done' } & StoredAnalysisJson)
  | { type: 'refused'; code: string; message: string };

const post = (m: AnalysisMessage) => parentPort!.postMessage(m);

// The engine runs here, off the worker's event loop, so ticks and mail keep going during a big mould.
parentPort!.once('message', (req: AnalysisRequest) => {
  // STL, 3MF or OBJ, told apart by content; the units were settled at upload (a 3MF's own, unless the maker chose).
  // The bytes were handed over to this thread, so a binary STL may be read in place.
  const file = readMouldFile(req.bytes, { maxTriangles: req.maxTriangles, archiveLimits: archiveLimitsFor(req.maxUnpackedBytes), consumeBytes: true });
  if (!file.ok) return post({ type: 'refused', code: file.error.code, message: file.error.message });
  post({ type: 'progress', value: 0.3 });
  const mesh = prepareMesh(file.value.soup, { units: req.units, up: req.up });
  if (!mesh.ok) return post({ type: 'refused', code: mesh.error.code, message: mesh.error.message });
  post({ type: 'progress', value: 0.5 });
  const analysis = analyzeCavity(mesh.value);
  if (!analysis.ok) return post({ type: 'refused', code: analysis.error.code, message: analysis.error.message });
  post({ type: 'progress', value: 0.9 });
  post({ type: 'done', ...storedAnalysisJson(analysis.value) });
});
