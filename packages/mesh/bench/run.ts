/**
 * Cavity engine benchmark: `npm run bench:mesh` (node --expose-gc --import tsx). For generated
 * terrain moulds of about 10k, 100k and 1M triangles it times, in one run:
 *  - in this process, each stage of the cavity report and the same box-dam fill by manifold-3d's
 *    boolean (box prism minus mould, volume), its WASM loaded once beforehand; each is run a few
 *    times and the fastest whole run is shown (the first runs warm up the JIT);
 *  - as whole processes, `gelpoint mold FILE --level L --dam box --json` (the built command, as a
 *    user runs it: start-up, reading the file, everything) against the reference as a process of
 *    its own (bench/manifold-child.mjs: loading the WASM, reading the welded mesh, the boolean),
 *    run in turn, pair by pair; medians of the pairs, and peak RSS by /usr/bin/time where present.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import Module from 'manifold-3d';
import { analyzeCavity, curve, encodeStlBinary, fillAt, parseStl, prepareMesh, readAnalysis, type CavityFill, type CavityMesh } from '../src/index';
import { heightFieldBlock } from '../test/moulds';

interface Peak {
  rssMb: number;
  heapMb: number;
}

function must<T>(r: { ok: true; value: T } | { ok: false; error: { message: string } }): T {
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

function measure<T>(stages: Record<string, number>, peak: Peak, label: string, work: () => T): T {
  const start = performance.now();
  const out = work();
  stages[label] = performance.now() - start;
  const m = process.memoryUsage();
  peak.rssMb = Math.max(peak.rssMb, m.rss / 2 ** 20);
  peak.heapMb = Math.max(peak.heapMb, (m.heapUsed + m.arrayBuffers) / 2 ** 20);
  return out;
}

function collect(): void {
  (globalThis as { gc?: () => void }).gc?.();
}

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '../../..');
const gelpointBin = join(root, 'apps/cli/bin/gelpoint.mjs');
const manifoldChild = join(here, 'manifold-child.mjs');
const timeBin = '/usr/bin/time';

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

interface ProcessRun {
  wallMs: number;
  peakMb: number | null;
  stdout: string;
}

/**
 * One whole process: wall time from spawn to exit, and its peak RSS as the kernel counted it.
 * `args` start with the program: an executable file runs as a user runs it (its #! line with it).
 */
function runProcess(dir: string, args: string[]): ProcessRun {
  const withTime = existsSync(timeBin);
  const rssFile = join(dir, 'peak-rss');
  const [command, argv] = withTime ? [timeBin, ['-f', '%M', '-o', rssFile, ...args]] : [args[0]!, args.slice(1)];
  const start = performance.now();
  const run = spawnSync(command, argv, { encoding: 'utf8', maxBuffer: 1 << 26 });
  const wallMs = performance.now() - start;
  if (run.status !== 0) throw new Error(`${args.join(' ')} failed: ${run.stderr}`);
  const peakKb = withTime ? Number(readFileSync(rssFile, 'utf8').trim().split('\n').pop()) : NaN;
  return { wallMs, peakMb: Number.isFinite(peakKb) ? peakKb / 1024 : null, stdout: run.stdout };
}

/** The welded mesh as the reference child reads it: counts, float32 corners, uint32 triangles. */
function indexedMeshFile(mesh: CavityMesh): Uint8Array {
  const out = new Uint8Array(8 + 12 * mesh.vertexCount + 12 * mesh.triangleCount);
  new Uint32Array(out.buffer, 0, 2).set([mesh.vertexCount, mesh.triangleCount]);
  new Float32Array(out.buffer, 8, 3 * mesh.vertexCount).set(mesh.positionsMm);
  new Uint32Array(out.buffer, 8 + 12 * mesh.vertexCount, 3 * mesh.triangleCount).set(mesh.triangles);
  return out;
}

interface WholeProcess {
  ours: ProcessRun[];
  theirs: ProcessRun[];
  ratios: number[];
  volumes: [number, number];
}

/** Our command and the reference process in turn, `pairs` times after one unmeasured pair. */
function wholeProcesses(dir: string, bytes: Uint8Array, mesh: CavityMesh, level: number, pairs: number): WholeProcess {
  const stl = join(dir, 'mould.stl'),
    indexed = join(dir, 'mould.mesh');
  writeFileSync(stl, bytes);
  writeFileSync(indexed, indexedMeshFile(mesh));
  // The command as installed: the bin runs through its own #! line (node, with the allocator's settings).
  const oursArgs = [gelpointBin, 'mold', stl, '--level', String(level), '--dam', 'box', '--json'];
  const theirsArgs = [process.execPath, manifoldChild, indexed, String(level)];
  runProcess(dir, oursArgs);
  runProcess(dir, theirsArgs);
  const ours: ProcessRun[] = [],
    theirs: ProcessRun[] = [],
    ratios: number[] = [];
  for (let r = 0; r < pairs; r++) {
    const a = runProcess(dir, oursArgs),
      b = runProcess(dir, theirsArgs);
    ours.push(a);
    theirs.push(b);
    ratios.push(b.wallMs / a.wallMs);
  }
  const ourVolume = (JSON.parse(ours[0]!.stdout) as { fill: { volumeMm3: number } }).fill.volumeMm3;
  const theirVolume = (JSON.parse(theirs[0]!.stdout) as { volumeMm3: number }).volumeMm3;
  return { ours, theirs, ratios, volumes: [ourVolume, theirVolume] };
}

interface OurRun {
  stages: Record<string, number>;
  total: number;
  peak: Peak;
  fill: CavityFill;
  mesh: CavityMesh;
  storedMb: number;
}

function ours(bytes: Uint8Array, level: number): OurRun {
  collect();
  const stages: Record<string, number> = {};
  const peak: Peak = { rssMb: 0, heapMb: 0 };
  const soup = measure(stages, peak, 'parse', () => must(parseStl(bytes)));
  const mesh = measure(stages, peak, 'weld+checks', () => must(prepareMesh(soup)));
  const analysis = measure(stages, peak, 'analyse', () => must(analyzeCavity(mesh, { levelsMm: [level] })));
  const model = measure(stages, peak, 'decode', () => must(readAnalysis(analysis)));
  // The depth map is walked when first read: read it, as the web app does.
  const fill = measure(stages, peak, 'fill', () => {
    const f = must(fillAt(model, level, 'box'));
    if (f.depthMap.depthsMm.length === 0) throw new Error('empty depth map');
    return f;
  });
  measure(stages, peak, 'curve', () => must(curve(model, 100, 'box')));
  const total = Object.values(stages).reduce((s, v) => s + v, 0);
  // What the API adds to keep the analysis (the command line never stores it): the base64 blobs as JSON.
  const storedMb = measure(stages, peak, 'store', () => JSON.stringify(analysis).length / 2 ** 20);
  return { stages, total, peak, fill, mesh, storedMb };
}

async function main(): Promise<void> {
  // The whole-process figures are of the built command: build it if it is stale.
  const build = spawnSync(process.execPath, [join(root, 'docker-free-scripts/build.mjs'), 'cli'], { stdio: 'inherit' });
  if (build.status !== 0) throw new Error('building the command failed');
  const dir = mkdtempSync(join(tmpdir(), 'gelpoint-bench-'));
  const wasmStart = performance.now();
  const kernel = await Module();
  kernel.setup();
  process.stdout.write(`manifold-3d WASM load (once, not counted in-process): ${(performance.now() - wasmStart).toFixed(0)} ms\n\n`);
  const sizes = [
    { name: '10k', cells: 70, runs: 5, pairs: 9 },
    { name: '100k', cells: 223, runs: 3, pairs: 7 },
    { name: '1M', cells: 707, runs: 3, pairs: 5 },
  ];
  for (const size of sizes) {
    const n = size.cells;
    const bytes = encodeStlBinary(
      heightFieldBlock({
        width: 300,
        depth: 200,
        bottomZ: 0,
        nx: n,
        ny: n,
        top: (x, y) => 40 - 12 * Math.sin((Math.PI * x) / 300) * Math.sin((Math.PI * y) / 200) - 3 * Math.cos(x / 7) * Math.sin(y / 5),
      }),
      'solid bench mould',
    );
    const level = 38;
    let best: OurRun | null = null;
    for (let r = 0; r < size.runs; r++) {
      const run = ours(bytes, level);
      if (!best || run.total < best.total) best = run;
    }
    const { stages, total, peak, fill, mesh, storedMb } = best!;

    let reference = 0,
      bestManifold = Infinity,
      manifoldStages: Record<string, number> = {};
    const manifoldPeak: Peak = { rssMb: 0, heapMb: 0 };
    const manifoldTimes: number[] = [];
    for (let r = 0; r < Math.min(size.runs, 3); r++) {
      collect();
      const m: Record<string, number> = {};
      const solid = measure(m, manifoldPeak, 'ofMesh', () =>
        kernel.Manifold.ofMesh(
          new kernel.Mesh({
            numProp: 3,
            vertProperties: Float32Array.from(mesh.positionsMm),
            triVerts: Uint32Array.from(mesh.triangles),
          }),
        ),
      );
      const { min, max } = mesh.bboxMm;
      reference = measure(m, manifoldPeak, 'boolean', () => {
        const prism = kernel.Manifold.cube([max[0] - min[0], max[1] - min[1], level - min[2]]).translate([min[0], min[1], min[2]]);
        const resin = prism.subtract(solid);
        const volume = resin.volume();
        prism.delete();
        resin.delete();
        return volume;
      });
      solid.delete();
      const sum = m.ofMesh! + m.boolean!;
      manifoldTimes.push(sum);
      if (sum < bestManifold) {
        bestManifold = sum;
        manifoldStages = m;
      }
    }
    const whole = wholeProcesses(dir, bytes, mesh, level, size.pairs);
    const ourWall = median(whole.ours.map((r) => r.wallMs)),
      theirWall = median(whole.theirs.map((r) => r.wallMs));
    const ourPeak = whole.ours.map((r) => r.peakMb ?? NaN),
      theirPeak = whole.theirs.map((r) => r.peakMb ?? NaN);
    const inProcessManifold = median(manifoldTimes);
    const mb = (values: number[]): string => (values.every(Number.isFinite) ? `${median(values).toFixed(0)} MB` : 'n/a (no /usr/bin/time)');
    const ms = (v: number): string => `${v.toFixed(1)} ms`;
    process.stdout.write(
      [
        `${size.name} mould: ${mesh.triangleCount} triangles (${(bytes.length / 2 ** 20).toFixed(1)} MB binary STL), method ${fill.method}, fastest of ${size.runs} runs`,
        `  gelpoint   parse ${ms(stages.parse!)} | weld+checks (and the triangle table) ${ms(stages['weld+checks']!)} | analyse (the series and the columns wait until read) ${ms(stages.analyse!)} | read back ${ms(stages.decode!)}`,
        `             fill at the level asked for + wetted + depth map (builds the columns) ${ms(stages.fill!)} | 100-level curve (builds the series) ${ms(stages.curve!)} | whole report ${ms(total)}`,
        `             peak RSS ${peak.rssMb.toFixed(0)} MB, heap + array buffers ${peak.heapMb.toFixed(0)} MB | storing the analysis as JSON (API only) ${ms(stages.store!)}, ${storedMb.toFixed(2)} MB`,
        `  manifold   ofMesh ${ms(manifoldStages.ofMesh!)} | box prism minus mould + volume ${ms(manifoldStages.boolean!)} | together ${ms(bestManifold)} | peak RSS ${manifoldPeak.rssMb.toFixed(0)} MB`,
        `  fill at ${level} mm, box dam: gelpoint ${fill.volumeMm3.toFixed(3)} mm³ (estimated error ${fill.estimatedErrorPct.toExponential(1)} %), manifold ${reference.toFixed(3)} mm³, difference ${((100 * (fill.volumeMm3 - reference)) / reference).toExponential(1)} %`,
        `  speed ratio: manifold's boolean takes ${(bestManifold / total).toFixed(1)}× as long as gelpoint's whole report`,
        `  whole processes, median of ${size.pairs} pairs run in turn (wall, from spawn to exit):`,
        `    gelpoint mold --dam box --json  ${ms(ourWall)} (range ${ms(Math.min(...whole.ours.map((r) => r.wallMs)))}–${ms(Math.max(...whole.ours.map((r) => r.wallMs)))}), peak RSS ${mb(ourPeak)}`,
        `    manifold-3d as a process        ${ms(theirWall)} (WASM load + reading the welded mesh + ofMesh + boolean), peak RSS ${mb(theirPeak)}`,
        `    manifold-3d in this process     ${ms(inProcessManifold)} (ofMesh + boolean, median of ${manifoldTimes.length}, WASM loaded once before)`,
        `    ratios: manifold process / gelpoint process ${median(whole.ratios).toFixed(2)}× (median of the pairs' ratios); manifold in-process / gelpoint process ${(inProcessManifold / ourWall).toFixed(2)}×`,
        `    fill: gelpoint ${whole.volumes[0].toFixed(3)} mm³, manifold process ${whole.volumes[1].toFixed(3)} mm³`,
        '',
      ].join('\n') + '\n',
    );
  }
  rmSync(dir, { recursive: true, force: true });
}

void main();
