import { parentPort } from 'node:worker_threads';
import { archiveLimitsFor, readMouldFile } from '@gelpoint/mesh';

// Reads off the event loop: a million-triangle file takes a noticeable moment, a 3MF longer (XML).
parentPort!.on('message', (msg: { id: number; bytes: Uint8Array; maxTriangles: number; maxUnpackedBytes: number }) => {
  const r = readMouldFile(msg.bytes, { maxTriangles: msg.maxTriangles, archiveLimits: archiveLimitsFor(msg.maxUnpackedBytes) });
  parentPort!.postMessage(
    r.ok
      ? { id: msg.id, ok: true, triangles: r.value.soup.triangleCount, format: r.value.format, fileUnits: r.value.fileUnits }
      : { id: msg.id, ok: false, error: r.error },
  );
});
