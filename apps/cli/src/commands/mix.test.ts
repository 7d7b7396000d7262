import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { CliError } from '../command';
import { command } from './mix';

const repoRoot = fileURLToPath(new URL('../../../../', import.meta.url));
// From memory of typical data sheets: epoxy resin about 1.16 g/mL, amine hardener 0.92–1.05 g/mL.
const densities = ['--density-a', '1.16', '--density-b', '0.97'];

async function json(argv: string[]) {
  return JSON.parse(await command([...argv, '--json'])) as {
    partA: { grams: number; ml: number };
    partB: { grams: number; ml: number };
    pigment: { grams: number };
    totalGrams: number;
    mixedDensityGPerMl: number;
    pigmentMl: number;
  };
}

describe('gelpoint mix', () => {
  it('prints the mix as JSON: 300 mL at 2:1 by volume', async () => {
    // 200 mL × 1.16 = 232 g of A, 100 mL × 0.97 = 97 g of B.
    const out = await json(['--volume-ml', '300', '--ratio', '2:1', '--by', 'volume', ...densities]);
    expect(Object.keys(out)).toEqual(['partA', 'partB', 'pigment', 'totalGrams', 'mixedDensityGPerMl', 'pigmentMl']);
    expect(out.partA.grams).toBeCloseTo(232, 9);
    expect(out.partA.ml).toBeCloseTo(200, 9);
    expect(out.partB.grams).toBeCloseTo(97, 9);
    expect(out.totalGrams).toBeCloseTo(329, 9);
    expect(out.mixedDensityGPerMl).toBeCloseTo(329 / 300, 12);
  });

  it("counts the pigment in the cup's volume: 300 mL with 3 % of a 1.0 g/mL colourant", async () => {
    // Volumes add: 300 = u·(2 + 1) + 0.03·(2·1.16 + 0.97)·u / 1.0, so u = 300 / 3.0987 mL per part of the ratio.
    const out = await json(['--volume-ml', '300', '--ratio', '2:1', '--by', 'volume', ...densities, '--pigment-pct', '3', '--pigment-density-g-ml', '1.0']);
    const u = 300 / (3 + 0.03 * 3.29);
    expect(out.partA.ml).toBeCloseTo(2 * u, 9);
    expect(out.pigment.grams).toBeCloseTo(0.03 * 3.29 * u, 9);
    expect(out.partA.ml + out.partB.ml + out.pigmentMl).toBeCloseTo(300, 9);
  });

  it('by weight the grams keep the ratio', async () => {
    const out = await json(['--volume-ml', '500', '--ratio', '100:45', '--by', 'weight', ...densities]);
    expect(out.partA.grams / out.partB.grams).toBeCloseTo(100 / 45, 12);
    expect(out.partA.ml + out.partB.ml).toBeCloseTo(500, 9);
    expect(out.pigment.grams).toBe(0);
  });

  it('prints a table without --json', async () => {
    const out = await command(['--volume-ml', '300', '--ratio', '2:1', '--by', 'volume', ...densities]);
    expect(out).toMatch(/part A\s+232\.0 g\s+200\.0 mL/);
    expect(out).toMatch(/total\s+329\.0 g\s+300\.0 mL/);
  });

  const bad: [string, string[], RegExp][] = [
    ['zero volume', ['--volume-ml', '0', '--ratio', '2:1', '--by', 'volume', ...densities], /volume to mix must be above zero/],
    ['negative volume', ['--volume-ml', '-5', '--ratio', '2:1', '--by', 'volume', ...densities], /volume to mix must be above zero/],
    ['unreadable ratio', ['--volume-ml', '300', '--ratio', 'abc', '--by', 'volume', ...densities], /mix ratio "abc"/],
    ['zero part', ['--volume-ml', '300', '--ratio', '2:0', '--by', 'volume', ...densities], /part of zero/],
    ['pigment over 100', ['--volume-ml', '300', '--ratio', '2:1', '--by', 'volume', ...densities, '--pigment-pct', '150'], /between 0 and 100/],
    ['missing --by', ['--volume-ml', '300', '--ratio', '2:1', ...densities], /--by is required/],
    ['wrong --by', ['--volume-ml', '300', '--ratio', '2:1', '--by', 'mass', ...densities], /--by must be "weight" or "volume"/],
    ['missing density', ['--volume-ml', '300', '--ratio', '2:1', '--by', 'volume', '--density-a', '1.16'], /--density-b is required/],
    ['zero density', ['--volume-ml', '300', '--ratio', '2:1', '--by', 'volume', '--density-a', '0', '--density-b', '0.97'], /density of part A/],
  ];
  for (const [name, argv, message] of bad) {
    it(`refuses ${name} with one line`, async () => {
      const run = command(argv);
      await expect(run).rejects.toBeInstanceOf(CliError);
      await expect(run).rejects.toThrow(message);
      await run.catch((err: Error) => expect(err.message).not.toContain('\n'));
    });
  }

  it('exits non-zero with one line on stderr through the real bin', () => {
    const result = spawnSync('node', ['apps/cli/bin/gelpoint.mjs', 'mix', '--volume-ml', '300', '--ratio', '2:0', '--by', 'volume', ...densities, '--json'], {
      cwd: repoRoot,
      encoding: 'utf8',
    });
    expect(result.status).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
    expect(result.stderr).toMatch(/^gelpoint mix: The mix ratio "2:0" has a part of zero/);
  });
});
