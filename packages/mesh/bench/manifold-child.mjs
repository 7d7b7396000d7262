// The reference as a whole process of its own, for `npm run bench:mesh`: loads manifold-3d's WASM
// once, reads an indexed mesh (the bench writes it from the welded mould, so the reference is not
// charged for reading or welding an STL), builds the solid and takes the box prism minus the
// mould below the level, and prints its volume and its own stage times as one JSON line.
// Plain JavaScript so no TypeScript loader sits in its start-up. Usage: node manifold-child.mjs MESH LEVEL
import { readFileSync } from 'node:fs';
import Module from 'manifold-3d';

const [file, levelText] = process.argv.slice(2);
const level = Number(levelText);
const started = performance.now();
const kernel = await Module();
kernel.setup();
const loaded = performance.now();
const bytes = readFileSync(file);
const header = new Uint32Array(bytes.buffer, bytes.byteOffset, 2);
const vertexCount = header[0],
  triangleCount = header[1];
const vertProperties = new Float32Array(bytes.buffer, bytes.byteOffset + 8, 3 * vertexCount);
const triVerts = new Uint32Array(bytes.buffer, bytes.byteOffset + 8 + 12 * vertexCount, 3 * triangleCount);
const read = performance.now();
const solid = kernel.Manifold.ofMesh(new kernel.Mesh({ numProp: 3, vertProperties, triVerts }));
const built = performance.now();
const { min, max } = solid.boundingBox();
const prism = kernel.Manifold.cube([max[0] - min[0], max[1] - min[1], level - min[2]]).translate([min[0], min[1], min[2]]);
const resin = prism.subtract(solid);
const volumeMm3 = resin.volume();
const done = performance.now();
process.stdout.write(`${JSON.stringify({ volumeMm3, wasmMs: loaded - started, readMs: read - loaded, ofMeshMs: built - read, booleanMs: done - built })}\n`);
