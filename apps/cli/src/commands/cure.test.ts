import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { activationEnergyFromKelvinQ } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { CliError } from '../command';
import { command } from './cure';

const repoRoot = fileURLToPath(new URL('../../../../', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'gelpoint-cure-'));

function csv(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

// ASTM C1074 uses Q = E/R = 5000 K; the command takes kJ/mol: 5000 × 8.314462618 / 1000.
const q5000KJ = String(activationEnergyFromKelvinQ(5000));

describe('gelpoint cure', () => {
  it('sums the equivalent age of a log: 24 h at 10 °C with Q = 5000 K is 13.14 h at 20 °C', async () => {
    // ASTM C1074 arithmetic: 24 × exp(−5000 × (1/283.15 − 1/293.15)) = 13.14 h.
    const file = csv('cold.csv', 'time,tempC\r\n2025-01-10T08:00:00Z,10\r\n2025-01-10T20:00:00Z,10\r\n2025-01-11T08:00:00Z,10\r\n');
    const out = JSON.parse(await command(['--readings', file, '--ref-temp-c', '20', '--activation-kj-mol', q5000KJ, '--json']));
    expect(out.equivalentHoursAtRef).toBeCloseTo(13.14, 2);
    expect(out.elapsedHours).toBe(24);
    expect(out.readings).toBe(3);
    expect(out.firstTime).toBe('2025-01-10T08:00:00Z');
    expect(out.lastTime).toBe('2025-01-11T08:00:00Z');
    expect(out.stalledHours).toBe(0);
    expect(out.lastReadingHoldsHours).toBe(0);
  });

  it('counts time below --min-temp-c as stalled', async () => {
    // 12 h at 10 °C (below 12 °C: nothing) then 12 h at 20 °C (12 h at the 20 °C reference).
    const file = csv('stall.csv', '2025-01-10T08:00:00Z,10\n2025-01-10T20:00:00Z,20\n2025-01-11T08:00:00Z,20\n');
    const out = JSON.parse(await command(['--readings', file, '--ref-temp-c', '20', '--activation-kj-mol', q5000KJ, '--min-temp-c', '12', '--json']));
    expect(out.stalledHours).toBe(12);
    expect(out.equivalentHoursAtRef).toBeCloseTo(12, 10);
    expect(out.cautions.map((c: { code: string }) => c.code)).toEqual(['cure_stalled']);
  });

  it('takes negative temperatures as flag values', async () => {
    // 24 h at −2 °C, above a −5 °C minimum: 24 × exp(−5000 × (1/271.15 − 1/293.15)) = 24 × 0.25061 = 6.01 h.
    const file = csv('frost.csv', '2025-01-10T08:00:00Z,-2\n2025-01-11T08:00:00Z,-2\n');
    const out = JSON.parse(await command(['--readings', file, '--ref-temp-c', '20', '--activation-kj-mol', q5000KJ, '--min-temp-c', '-5', '--json']));
    expect(out.minTempC).toBe(-5);
    expect(out.stalledHours).toBe(0);
    expect(out.equivalentHoursAtRef).toBeCloseTo(24 * Math.exp(-5000 * (1 / 271.15 - 1 / 293.15)), 9);
    expect(out.equivalentHoursAtRef).toBeCloseTo(6.01, 2);
  });

  it('prints a summary without --json', async () => {
    const file = csv('plain.csv', '2025-01-10T08:00:00Z,20\n2025-01-10T10:00:00Z,20\n');
    const out = await command(['--readings', file, '--ref-temp-c', '20', '--activation-kj-mol', '50']);
    expect(out).toMatch(/equivalent at 20 °C\s+2\.00 h/);
  });

  it('counts every bad row of a very bad log, past the thousand kept one by one', async () => {
    const file = csv('worse.csv', `time,tempC\n${'yesterday,10\n'.repeat(1500)}`);
    await command(['--readings', file, '--ref-temp-c', '20', '--activation-kj-mol', '50']).catch((err: Error) => {
      expect(err.message).toContain('; and 1495 more.');
    });
    await expect(command(['--readings', file, '--ref-temp-c', '20', '--activation-kj-mol', '50'])).rejects.toBeInstanceOf(CliError);
  });

  it('refuses a bad file with one line naming the rows', async () => {
    const file = csv('bad.csv', 'time,tempC\n2025-01-10T08:00:00Z,10\n2025-01-10T09:00:00Z,10\n2025-01-10T10:00:00Z,10\n2025-01-10T11:00:00Z,10\n2025-01-10T12:00:00Z,10\nyesterday,10\n2025-01-10T11:30:00Z,x\n');
    const run = command(['--readings', file, '--ref-temp-c', '20', '--activation-kj-mol', '50']);
    await expect(run).rejects.toBeInstanceOf(CliError);
    await run.catch((err: Error) => {
      expect(err.message).toContain('row 7: time "yesterday" is not an ISO date');
      expect(err.message).toContain('row 8:');
      expect(err.message).toContain('was not imported');
      expect(err.message).not.toContain('\n');
    });
  });

  it('refuses a missing file and missing flags', async () => {
    await expect(command(['--readings', join(dir, 'nope.csv'), '--ref-temp-c', '20', '--activation-kj-mol', '50'])).rejects.toThrow(/cannot read .*nope\.csv \(ENOENT\)/);
    await expect(command(['--readings', 'x.csv', '--activation-kj-mol', '50'])).rejects.toThrow('--ref-temp-c is required');
  });

  it('exits non-zero with one line on stderr through the real bin', () => {
    const file = csv('order.csv', '2025-01-10T08:00:00Z,10\n2025-01-10T07:00:00Z,10\n');
    const result = spawnSync('node', ['apps/cli/bin/gelpoint.mjs', 'cure', '--readings', file, '--ref-temp-c', '20', '--activation-kj-mol', '50', '--json'], {
      cwd: repoRoot,
      encoding: 'utf8',
    });
    expect(result.status).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
    expect(result.stderr).toContain('row 2: time "2025-01-10T07:00:00Z" is earlier than row 1');
  });
});
