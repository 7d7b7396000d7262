import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { encodeStlBinary } from '@gelpoint/mesh';
import { describe, expect, it } from 'vitest';
import { encode3mf, encodeObj } from '../../../packages/mesh/test/mould-files';
import { cellSolid, recessedChamberBlock } from '../../../packages/mesh/test/moulds';

const repoRoot = fileURLToPath(new URL('../../..', import.meta.url));
const bin = join(repoRoot, 'apps/cli/bin/gelpoint.mjs');

// The installed `gelpoint` is the bin itself, run through its #! line, which also tells glibc's
// allocator to ask for transparent huge pages for its big blocks (fewer page faults on a big mould).
describe('the gelpoint bin', () => {
  it('runs through its own #! line and reports what it reports through node', () => {
    const dir = mkdtempSync(join(tmpdir(), 'gelpoint-bin-'));
    const file = join(dir, 'pocket.stl');
    // A 30 × 30 × 10 mm block with a 10 × 10 mm pocket from z = 4 up.
    writeFileSync(file, encodeStlBinary(cellSolid([0, 10, 20, 30], [0, 10, 20, 30], [0, 4, 10], (i, j, k) => !(i === 1 && j === 1 && k === 1))));
    const args = ['mold', file, '--level', '10', '--json'];
    const direct = spawnSync(bin, args, { cwd: repoRoot, encoding: 'utf8' });
    const throughNode = spawnSync(process.execPath, [bin, ...args], { cwd: repoRoot, encoding: 'utf8' });
    expect(direct.stderr).toBe('');
    expect(direct.status).toBe(0);
    expect(direct.stdout).toBe(throughNode.stdout);
    expect((JSON.parse(direct.stdout) as { fill: { volumeMm3: number } }).fill.volumeMm3).toBeCloseTo(10 * 10 * 6, 6);
  });

  it('reads a 3MF and an OBJ, whose readers the built command loads only for such a file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'gelpoint-bin-'));
    // The same pocket block as above: at 10 mm a 10 × 10 × 6 mm³ pocket (cuboid, CRC), the 3MF stating millimetres.
    const pocket = cellSolid([0, 10, 20, 30], [0, 10, 20, 30], [0, 4, 10], (i, j, k) => !(i === 1 && j === 1 && k === 1));
    const files = { '3mf': encode3mf(pocket, 'millimeter', 1), obj: encodeObj(pocket, { quads: true }) };
    for (const [format, bytes] of Object.entries(files)) {
      const file = join(dir, `pocket.${format}`);
      writeFileSync(file, bytes);
      const run = spawnSync(bin, ['mold', file, '--level', '10', '--json'], { cwd: repoRoot, encoding: 'utf8' });
      expect(run.stderr).toBe('');
      const report = JSON.parse(run.stdout) as { format: string; fill: { volumeMm3: number } };
      expect(report.format).toBe(format);
      expect(report.fill.volumeMm3).toBeCloseTo(10 * 10 * 6, 6);
    }
  });

  it('works out the outline under an overhang with the polygon library, which the built command loads only then', () => {
    const dir = mkdtempSync(join(tmpdir(), 'gelpoint-bin-'));
    // A shaft (x, y 15 → 25) into a chamber (x, y 5 → 35, z 5 → 10) whose ceiling has a recess
    // (x, y 5 → 10, z 10 → 12) that holds its air. At 15 mm (cuboids, CRC): 30 × 30 × 5 + 10 × 10 × 5 mm³
    // of resin and 5 × 5 × 2 mm³ of air.
    const file = join(dir, 'undercut.stl');
    writeFileSync(file, encodeStlBinary(recessedChamberBlock()));
    const run = spawnSync(bin, ['mold', file, '--level', '15', '--json'], { cwd: repoRoot, encoding: 'utf8' });
    expect(run.stderr).toBe('');
    const report = JSON.parse(run.stdout) as { fill: { volumeMm3: number; trappedAirMm3: number } };
    expect(report.fill.volumeMm3).toBeCloseTo(30 * 30 * 5 + 10 * 10 * 5, 6);
    expect(report.fill.trappedAirMm3).toBeCloseTo(5 * 5 * 2, 6);
  });

  it('hands node the allocator setting on its #! line, and no extra CA bundle to load', () => {
    const line = readFileSync(bin, 'utf8').split('\n')[0]!;
    expect(line.startsWith('#!')).toBe(true);
    // Run the #! line as the kernel does (its interpreter, the rest of the line as one argument),
    // with a script in place of the bin's that prints what node was given.
    const text = line.slice(2).trim();
    const interpreter = text.split(' ')[0]!;
    // A machine may point every Node process at an extra CA bundle, which node reads and parses
    // as it starts; the command opens no TLS connection, so its #! line drops the setting.
    const bundle = join(repoRoot, 'tsconfig.base.json');
    const run = spawnSync(
      interpreter,
      [text.slice(interpreter.length + 1), '-e', 'console.log(process.env.GLIBC_TUNABLES, process.env.NODE_EXTRA_CA_CERTS ?? "unset")'],
      { encoding: 'utf8', env: { PATH: process.env.PATH ?? '', NODE_EXTRA_CA_CERTS: bundle } },
    );
    expect(run.status).toBe(0);
    expect(run.stderr).toBe('');
    expect(run.stdout.trim()).toBe('glibc.malloc.hugetlb=1 unset');
  });
});
