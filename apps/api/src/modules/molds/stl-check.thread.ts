import { parentPort } from 'node:worker_threads';
import { analyzeCavity, archiveLimitsFor, readMouldForAnalysis, storedAnalysisJson, type FileUnits, type UpAxis } from '@gelpoint/mesh';
import type { AnalysisReply, CheckReply, CheckRequest } from './stl-check';

// Reads off the event loop: a million-triangle file takes a noticeable moment, a 3MF longer (XML). Asked to, it
// then analyses the file it read, while the request is still storing it.
parentPort!.on('message', (msg: CheckRequest) => {
  // The bytes are shared with the request, which is writing them to the database meanwhile: read, never written.
  const read = readMouldForAnalysis(msg.bytes, { maxTriangles: msg.maxTriangles, archiveLimits: archiveLimitsFor(msg.maxUnpackedBytes) });
  const check: CheckReply = read.ok
    ? { id: msg.id, kind: 'check', ok: true, triangles: read.value.triangles, format: read.value.format, fileUnits: read.value.fileUnits }
    : { id: msg.id, kind: 'check', ok: false, error: read.error };
  parentPort!.postMessage(check);
  if (!msg.analyse) return;
  let reply: AnalysisReply = { id: msg.id, kind: 'analysis', analysis: null };
  if (read.ok) {
    try {
      // The units the upload settles on: the maker's, else the file's own (3MF), else mm.
      const units: FileUnits = msg.analyse.units ?? read.value.fileUnits ?? 'mm';
      const up: UpAxis = msg.analyse.up;
      const mesh = read.value.prepare(units, up);
      const analysis = mesh.ok ? analyzeCavity(mesh.value) : mesh;
      // A mesh the engine refuses is left to the worker, which records the refusal as it always has.
      if (analysis.ok) reply = { id: msg.id, kind: 'analysis', analysis: { units, up, ...storedAnalysisJson(analysis.value) } };
    } catch {
      // Left to the worker as well.
    }
  }
  parentPort!.postMessage(reply);
});
