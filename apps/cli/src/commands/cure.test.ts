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
    const rows = Array.from({ length: 7 }, (_, i) => `${new Date(Date.UTC(2025, 0, 10, 8 + 4 * i)).toISOString()},10`);
    const file = csv('cold.csv', `time,tempC\r\n${rows.join('\r\n')}\r\n`);
    const out = JSON.parse(await command(['--readings', file, '--ref-temp-c', '20', '--activation-kj-mol', q5000KJ, '--json']));
    expect(out.equivalentHoursAtRef).toBeCloseTo(13.14, 2);
    expect(out.elapsedHours).toBe(24);
    expect(out.readings).toBe(7);
    expect(out.firstTime).toBe('2025-01-10T08:00:00.000Z'.replace('.000', ''));
    expect(out.lastTime).toBe('2025-01-11T08:00:00Z');
    expect(out.belowMinimumHours).toBe(0);
    expect(out.gaps).toEqual([]);
  });

  it('counts each interval at the average of its readings: a 15 → 35 °C ramp read every 3 h (ASTM C1074)', async () => {
    // The integral of the definition over the straight-line ramp is 15.98 h (Ea 52 kJ/mol, reference 22 °C);
    // the interval-average form gives 15.90 h; holding each reading until the next gave 13.35 h.
    const rows = [15, 20, 25, 30, 35].map((t, i) => `${new Date(Date.UTC(2025, 0, 10, 3 * i)).toISOString()},${t}`);
    const out = JSON.parse(await command(['--readings', csv('ramp.csv', rows.join('\n')), '--ref-temp-c', '22', '--activation-kj-mol', '52', '--json']));
    expect(out.equivalentHoursAtRef).toBeCloseTo(15.9, 1);
    expect(out.spans.map((s: { source: string; tempC: number }) => [s.source, s.tempC])).toEqual([
      ['logged', 17.5],
      ['logged', 22.5],
      ['logged', 27.5],
      ['logged', 32.5],
    ]);
  });

  it('lists a gap longer than twice --carry-h and counts it at the lower neighbouring reading', async () => {
    // 20 °C at 00:00, 30 °C at 12:00, carry 2 h: 2 h at 20, 8 h gap at 20, 2 h at 30 (Q = 5000 K, reference 20 °C).
    const file = csv('gap.csv', '2025-01-10T00:00:00Z,20\n2025-01-10T12:00:00Z,30\n');
    const out = JSON.parse(await command(['--readings', file, '--ref-temp-c', '20', '--activation-kj-mol', q5000KJ, '--carry-h', '2', '--json']));
    expect(out.gaps).toEqual([{ from: '2025-01-10T02:00:00Z', to: '2025-01-10T10:00:00Z', hours: 8, tempC: 20 }]);
    expect(out.equivalentHoursAtRef).toBeCloseTo(10 + 2 * Math.exp(-5000 * (1 / 303.15 - 1 / 293.15)), 9);
    expect(out.cautions.map((c: { code: string }) => c.code)).toEqual(['cure_log_gap']);
  });

  it('counts time below --min-temp-c slowly and flags it, with no cliff at the minimum', async () => {
    // 12 h at 10 °C (below 12 °C) then 12 h at 20 °C; intervals of 4 h, each at the average of its two readings.
    const temps = [10, 10, 10, 10, 20, 20, 20];
    const rows = temps.map((t, i) => `${new Date(Date.UTC(2025, 0, 10, 8 + 4 * i)).toISOString()},${t}`);
    const out = JSON.parse(
      await command(['--readings', csv('slow.csv', rows.join('\n')), '--ref-temp-c', '20', '--activation-kj-mol', q5000KJ, '--min-temp-c', '12', '--json']),
    );
    const rate = (t: number) => Math.exp(-5000 * (1 / (t + 273.15) - 1 / 293.15));
    expect(out.belowMinimumHours).toBe(12);
    expect(out.equivalentHoursAtRef).toBeCloseTo(12 * rate(10) + 4 * rate(15) + 8, 10);
    expect(out.cautions.map((c: { code: string }) => c.code)).toEqual(['cure_below_minimum']);
  });

  it('takes negative temperatures as flag values', async () => {
    // 24 h at −2 °C, above a −5 °C minimum: 24 × exp(−5000 × (1/271.15 − 1/293.15)) = 24 × 0.25061 = 6.01 h.
    const file = csv('frost.csv', '2025-01-10T08:00:00Z,-2\n2025-01-11T08:00:00Z,-2\n');
    const out = JSON.parse(
      await command(['--readings', file, '--ref-temp-c', '20', '--activation-kj-mol', q5000KJ, '--min-temp-c', '-5', '--carry-h', '12', '--json']),
    );
    expect(out.minTempC).toBe(-5);
    expect(out.belowMinimumHours).toBe(0);
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
    const file = csv(
      'bad.csv',
      'time,tempC\n2025-01-10T08:00:00Z,10\n2025-01-10T09:00:00Z,10\n2025-01-10T10:00:00Z,10\n2025-01-10T11:00:00Z,10\n2025-01-10T12:00:00Z,10\nyesterday,10\n2025-01-10T11:30:00Z,x\n',
    );
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
    await expect(command(['--readings', join(dir, 'nope.csv'), '--ref-temp-c', '20', '--activation-kj-mol', '50'])).rejects.toThrow(
      /cannot read .*nope\.csv \(ENOENT\)/,
    );
    await expect(command(['--readings', 'x.csv', '--activation-kj-mol', '50'])).rejects.toThrow('--ref-temp-c is required');
  });

  it('explains itself with --help on every command, exit 0', () => {
    for (const name of ['mold', 'mix', 'cure']) {
      const result = spawnSync('node', ['apps/cli/bin/gelpoint.mjs', name, '--help'], { cwd: repoRoot, encoding: 'utf8' });
      expect(result.status, name).toBe(0);
      expect(result.stdout, name).toMatch(new RegExp(`^gelpoint ${name} `));
      expect(result.stderr, name).toBe('');
    }
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
