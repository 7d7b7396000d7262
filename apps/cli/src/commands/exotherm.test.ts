import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { CliError } from '../command';
import { command } from './exotherm';

const repoRoot = fileURLToPath(new URL('../../../../', import.meta.url));
// An invented slow system: 160 J/g, 53 kJ/mol (inside Barral et al. 1995's 44–57), 10 h gel at 22 °C.
const system = ['--reaction-heat-j-g', '160', '--activation-kj-mol', '53', '--ref-temp-c', '22', '--gel-min', '600'];

async function json(argv: string[]) {
  return JSON.parse(await command([...argv, '--json'])) as {
    peakC: number;
    timeToPeakMin: number;
    peakDepthMm: number;
    model: string;
    maxLayerMm?: number;
    adiabaticRiseK: number;
    runaway: boolean;
  };
}

describe('gelpoint exotherm', () => {
  it('prints one JSON object with the peak, when and where', async () => {
    const out = await json(['--depth-mm', '30', '--ambient-c', '22', ...system]);
    expect(out.peakC).toBeGreaterThan(22);
    // Energy balance: no layer passes its adiabatic ceiling, start + ΔH/cp = 22 + 160/1.5.
    expect(out.adiabaticRiseK).toBeCloseTo(160 / 1.5, 9);
    expect(out.peakC).toBeLessThan(22 + 160 / 1.5);
    expect(out.timeToPeakMin).toBeGreaterThan(0);
    expect(out.peakDepthMm).toBeGreaterThan(0);
    expect(out.peakDepthMm).toBeLessThan(30);
    expect(out.model).toMatch(/Kamal & Sourour \(1973\)/);
    expect(out.maxLayerMm).toBeUndefined();
  });

  it('with no heat of reaction the layer stays at the shop temperature', async () => {
    const out = await json([
      '--depth-mm',
      '30',
      '--ambient-c',
      '18',
      '--reaction-heat-j-g',
      '0',
      '--activation-kj-mol',
      '53',
      '--ref-temp-c',
      '22',
      '--gel-min',
      '600',
    ]);
    expect(out.peakC).toBeCloseTo(18, 9);
  });

  it('an insulated base runs hotter than wood, which takes heat away', async () => {
    const wood = await json(['--depth-mm', '30', '--ambient-c', '22', ...system, '--base', 'wood']);
    const insulated = await json(['--depth-mm', '30', '--ambient-c', '22', ...system, '--base', 'insulated']);
    expect(insulated.peakC).toBeGreaterThan(wood.peakC);
  });

  it('with --limit-c gives the deepest layer under the limit, and that layer forecasts under it', async () => {
    const out = await json(['--depth-mm', '30', '--ambient-c', '22', ...system, '--limit-c', '45']);
    expect(out.maxLayerMm).toBeGreaterThan(5);
    const at = await json(['--depth-mm', String(out.maxLayerMm), '--ambient-c', '22', ...system]);
    expect(at.peakC).toBeLessThanOrEqual(45);
    const deeper = await json(['--depth-mm', String(out.maxLayerMm! + 1), '--ambient-c', '22', ...system]);
    expect(deeper.peakC).toBeGreaterThan(45);
  });

  it('prints a readable report with a one-line caution without --json', async () => {
    const out = await command(['--depth-mm', '30', '--ambient-c', '22', ...system, '--limit-c', '45']);
    expect(out).toMatch(/^layer\s+30 mm poured at 22 °C on bare wood/);
    expect(out).toMatch(/peak\s+\d+\.\d °C/);
    expect(out).toMatch(/deepest under 45 °C\s+\d+\.\d mm/);
    expect(out.trim().split('\n').at(-1)).toMatch(/^Estimate only: .*SDS and TDS/);
  });

  const bad: [string, string[], RegExp][] = [
    ['negative depth', ['--depth-mm', '-5', '--ambient-c', '22', ...system], /layer depth must be a number of mm above 0/],
    [
      'negative heat',
      ['--depth-mm', '5', '--ambient-c', '22', '--reaction-heat-j-g', '-160', '--activation-kj-mol', '53', '--ref-temp-c', '22', '--gel-min', '600'],
      /heat of reaction must be a number from 0/,
    ],
    ['text for a number', ['--depth-mm', 'deep', '--ambient-c', '22', ...system], /--depth-mm must be a number, got "deep"/],
    ['unknown base', ['--depth-mm', '5', '--ambient-c', '22', ...system, '--base', 'stone'], /--base must be "wood" or "insulated"/],
    [
      'missing gel time',
      ['--depth-mm', '5', '--ambient-c', '22', '--reaction-heat-j-g', '160', '--activation-kj-mol', '53', '--ref-temp-c', '22'],
      /--gel-min is required/,
    ],
    ['limit below the shop', ['--depth-mm', '5', '--ambient-c', '22', ...system, '--limit-c', '20'], /not above the starting temperature/],
  ];
  for (const [name, argv, message] of bad) {
    it(`refuses ${name} with one line`, async () => {
      const run = command(argv);
      await expect(run).rejects.toBeInstanceOf(CliError);
      await expect(run).rejects.toThrow(message);
      await run.catch((err: Error) => expect(err.message).not.toContain('\n'));
    });
  }

  it('prints its own usage for --help and exits 0 through the real bin', () => {
    const result = spawnSync('node', ['apps/cli/bin/gelpoint.mjs', 'exotherm', '--help'], { cwd: repoRoot, encoding: 'utf8' });
    expect(result.status).toBe(0);
    expect(result.stdout).toMatch(/^gelpoint exotherm --depth-mm D /);
    expect(result.stdout).toContain('--limit-c L');
    expect(result.stderr).toBe('');
  });

  it('exits non-zero with one line on stderr through the real bin', () => {
    const result = spawnSync('node', ['apps/cli/bin/gelpoint.mjs', 'exotherm', '--depth-mm', '-5', '--ambient-c', '22', ...system, '--json'], {
      cwd: repoRoot,
      encoding: 'utf8',
    });
    expect(result.status).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
    expect(result.stderr).toMatch(/^gelpoint exotherm: The layer depth must be a number of mm above 0/);
  });

  it('is listed in the usage of gelpoint itself', () => {
    const result = spawnSync('node', ['apps/cli/bin/gelpoint.mjs', '--help'], { cwd: repoRoot, encoding: 'utf8' });
    expect(result.status).toBe(0);
    expect(result.stdout).toContain('gelpoint exotherm --depth-mm D --ambient-c T');
  });
});
