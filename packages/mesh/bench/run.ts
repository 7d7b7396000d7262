/**
 * Cavity engine benchmark: `npm run bench:mesh` (node --expose-gc --import tsx). For generated
 * terrain moulds of about 10k, 100k and 1M triangles it times each stage of the cavity report and
 * the same box-dam fill by manifold-3d's boolean (box prism minus mould, volume), in one run.
 * Each is run a few times and the fastest whole run is shown (the first runs warm up the JIT).
 */
import Module from 'manifold-3d';
import { analyzeCavity, curve, encodeStlBinary, fillAt, parseStl, prepareMesh, readAnalysis, type CavityFill, type CavityMesh } from '../src/index';
import { heightFieldBlock } from '../test/moulds';

interface Peak { rssMb: number; heapMb: number }

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

interface OurRun { stages: Record<string, number>; total: number; peak: Peak; fill: CavityFill; mesh: CavityMesh; storedMb: number }

function ours(bytes: Uint8Array, level: number): OurRun {
  collect();
  const stages: Record<string, number> = {};
  const peak: Peak = { rssMb: 0, heapMb: 0 };
  const soup = measure(stages, peak, 'parse', () => must(parseStl(bytes)));
  const mesh = measure(stages, peak, 'weld+checks', () => must(prepareMesh(soup)));
  const analysis = measure(stages, peak, 'analyse', () => must(analyzeCavity(mesh, { levelsMm: [level] })));
  const model = measure(stages, peak, 'decode', () => must(readAnalysis(analysis)));
  const fill = measure(stages, peak, 'fill', () => must(fillAt(model, level, 'box')));
  measure(stages, peak, 'curve', () => must(curve(model, 100, 'box')));
  const total = Object.values(stages).reduce((s, v) => s + v, 0);
  return { stages, total, peak, fill, mesh, storedMb: JSON.stringify(analysis).length / 2 ** 20 };
}

async function main(): Promise<void> {
  const kernel = await Module();
  kernel.setup();
  const sizes = [{ name: '10k', cells: 70, runs: 5 }, { name: '100k', cells: 223, runs: 3 }, { name: '1M', cells: 707, runs: 3 }];
  for (const size of sizes) {
    const n = size.cells;
    const bytes = encodeStlBinary(heightFieldBlock({
      width: 300, depth: 200, bottomZ: 0, nx: n, ny: n,
      top: (x, y) => 40 - 12 * Math.sin((Math.PI * x) / 300) * Math.sin((Math.PI * y) / 200) - 3 * Math.cos(x / 7) * Math.sin(y / 5),
    }), 'solid bench mould');
    const level = 38;
    let best: OurRun | null = null;
    for (let r = 0; r < size.runs; r++) {
      const run = ours(bytes, level);
      if (!best || run.total < best.total) best = run;
    }
    const { stages, total, peak, fill, mesh, storedMb } = best!;

    let reference = 0, bestManifold = Infinity, manifoldStages: Record<string, number> = {};
    const manifoldPeak: Peak = { rssMb: 0, heapMb: 0 };
    for (let r = 0; r < Math.min(size.runs, 2); r++) {
      collect();
      const m: Record<string, number> = {};
      const solid = measure(m, manifoldPeak, 'ofMesh', () => kernel.Manifold.ofMesh(new kernel.Mesh({
        numProp: 3, vertProperties: Float32Array.from(mesh.positionsMm), triVerts: Uint32Array.from(mesh.triangles),
      })));
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
      if (sum < bestManifold) { bestManifold = sum; manifoldStages = m; }
    }
    const ms = (v: number): string => `${v.toFixed(1)} ms`;
    process.stdout.write([
      `${size.name} mould: ${mesh.triangleCount} triangles (${(bytes.length / 2 ** 20).toFixed(1)} MB binary STL), method ${fill.method}, fastest of ${size.runs} runs`,
      `  gelpoint   parse ${ms(stages.parse!)} | weld+checks ${ms(stages['weld+checks']!)} | analyse ${ms(stages.analyse!)} | decode stored analysis ${ms(stages.decode!)}`,
      `             fill + wetted + depth map ${ms(stages.fill!)} | 100-level curve ${ms(stages.curve!)} | whole report ${ms(total)}`,
      `             peak RSS ${peak.rssMb.toFixed(0)} MB, heap + array buffers ${peak.heapMb.toFixed(0)} MB | stored analysis ${storedMb.toFixed(2)} MB`,
      `  manifold   ofMesh ${ms(manifoldStages.ofMesh!)} | box prism minus mould + volume ${ms(manifoldStages.boolean!)} | together ${ms(bestManifold)} | peak RSS ${manifoldPeak.rssMb.toFixed(0)} MB`,
      `  fill at ${level} mm, box dam: gelpoint ${fill.volumeMm3.toFixed(3)} mm³ (estimated error ${fill.estimatedErrorPct.toExponential(1)} %), manifold ${reference.toFixed(3)} mm³, difference ${((100 * (fill.volumeMm3 - reference)) / reference).toExponential(1)} %`,
      `  speed ratio: manifold's boolean takes ${(bestManifold / total).toFixed(1)}× as long as gelpoint's whole report`,
      '',
    ].join('\n') + '\n');
  }
}

void main();
