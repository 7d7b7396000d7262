import { parentPort } from 'node:worker_threads';
import { parseStl } from '@gelpoint/mesh';

// Parses off the event loop: a million-triangle file takes a noticeable moment to read.
parentPort!.on('message', (msg: { id: number; bytes: Uint8Array; maxTriangles: number }) => {
  const r = parseStl(msg.bytes, { maxTriangles: msg.maxTriangles });
  parentPort!.postMessage(r.ok ? { id: msg.id, ok: true, triangles: r.value.triangleCount } : { id: msg.id, ok: false, error: r.error });
});
