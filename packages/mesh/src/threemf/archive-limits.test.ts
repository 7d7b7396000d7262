import { zipSync } from 'fflate';
import { beforeAll, describe, expect, it } from 'vitest';
import { withStatedSize } from '../../test/zip-bytes';
import { readMouldFile } from '../mould-file';
import { ArchiveBudget, defaultArchiveLimits, unpackEntry } from './archive-limits';
import { read3mf } from './read-3mf';
import { readZipDirectory } from './zip-directory';
import { ok } from '../result';

// A zip bomb: a model part that opens like a 3MF model and then runs on as 64 MiB of spaces
// (valid XML whitespace), which deflate packs about 1000 to 1.
const bombBytes = 64 * 2 ** 20;
let bomb: Uint8Array;

beforeAll(() => {
  const model = new Uint8Array(bombBytes).fill(0x20);
  model.set(new TextEncoder().encode('<?xml version="1.0"?><model xmlns="http://schemas.microsoft.com/3dmanufacturing/core/2015/02">'));
  bomb = zipSync({ '3D/3dmodel.model': model }, { level: 6 });
});

function timed<T>(f: () => T): { value: T; ms: number } {
  const start = performance.now();
  const value = f();
  return { value, ms: performance.now() - start };
}

/** Unpacks the model part alone with the given limits, counting what was really unpacked. */
function unpackModel(zip: Uint8Array, limits: Partial<typeof defaultArchiveLimits>) {
  const entry = readZipDirectory(zip);
  if (!entry.ok) throw new Error(entry.error.message);
  const budget = new ArchiveBudget({ ...defaultArchiveLimits, ...limits });
  const result = unpackEntry(zip, entry.value.get('3d/3dmodel.model')!, budget, () => ok(undefined));
  return { result, unpacked: budget.unpackedBytes };
}

describe('3MF zip-bomb limits', () => {
  it('the bomb is small and would unpack to 64 MiB', () => {
    expect(bomb.length).toBeLessThan(bombBytes / 500);
  });

  it('refuses a part that unpacks to more than 100 times its packed size, quickly', () => {
    const run = timed(() => readMouldFile(bomb));
    expect(run.value.ok).toBe(false);
    if (run.value.ok) return;
    expect(run.value.error.code).toBe('threemf_compression_ratio');
    expect(run.value.error.message).toMatch(/more than 100 times its packed size.*zip bomb; export the mould again/);
    expect(run.ms).toBeLessThan(1500);
    // The sizes the directory states give it away before anything is unpacked.
    expect(unpackModel(bomb, {}).unpacked).toBe(0);
  });

  it('refuses a part that lies about its size after one step of unpacking', () => {
    const liar = withStatedSize(bomb, '3D/3dmodel.model', 1000);
    const { result, unpacked } = unpackModel(liar, {});
    expect(result.ok ? '' : result.error.code).toBe('threemf_compression_ratio');
    // 16 kB of packed data comes out as at most about 16.5 MB (deflate's longest match, 258 bytes, in as
    // little as 2 bits: RFC 1951 §3.2.5), far below the 64 MiB the part holds.
    expect(unpacked).toBeGreaterThan(0);
    expect(unpacked).toBeLessThan(17 * 2 ** 20);
    const run = timed(() => read3mf(liar));
    expect(run.value.ok ? '' : run.value.error.code).toBe('threemf_compression_ratio');
    expect(run.ms).toBeLessThan(1500);
  });

  it('refuses a part whose stated size passes the limit without unpacking anything', () => {
    const { result, unpacked } = unpackModel(bomb, { maxPartBytes: 8 * 2 ** 20, maxRatio: 1e9 });
    expect(result.ok ? '' : result.error.code).toBe('threemf_too_large');
    expect(unpacked).toBe(0);
  });

  it('refuses a part that lies about its size as soon as the unpacked bytes pass the limit, not after unpacking it all', () => {
    const liar = withStatedSize(bomb, '3D/3dmodel.model', 1000);
    const { result, unpacked } = unpackModel(liar, { maxPartBytes: 8 * 2 ** 20, maxRatio: 1e9 });
    expect(result.ok ? '' : result.error.code).toBe('threemf_too_large');
    expect(unpacked).toBeGreaterThan(8 * 2 ** 20);
    expect(unpacked).toBeLessThan(8 * 2 ** 20 + 17 * 2 ** 20);
    const viaReader = read3mf(liar, { archiveLimits: { maxPartBytes: 8 * 2 ** 20, maxRatio: 1e9 } });
    expect(viaReader.ok ? '' : viaReader.error.message).toMatch(
      /unpacks to more than 8 MB, more than Gelpoint reads from one file \(a guard against zip bombs\)/,
    );
  });

  it('caps the packed size of a part and the total over all parts', () => {
    const packed = unpackModel(bomb, { maxPackedPartBytes: 1024 });
    expect(packed.result.ok ? '' : packed.result.error.message).toMatch(/is larger than 1 kB packed/);
    const two = zipSync({
      '3D/3dmodel.model': new TextEncoder().encode(
        `<model xmlns="http://schemas.microsoft.com/3dmanufacturing/core/2015/02" xmlns:p="http://schemas.microsoft.com/3dmanufacturing/production/2015/06"><resources><object id="1"><components><component objectid="1" p:path="/3D/other.model"/></components></object></resources><build><item objectid="1"/></build></model>${' '.repeat(5 * 2 ** 20)}`,
      ),
      '3D/other.model': new Uint8Array(5 * 2 ** 20).fill(0x20),
    });
    const r = read3mf(two, { archiveLimits: { maxTotalBytes: 8 * 2 ** 20, maxRatio: 1e9 } });
    expect(r.ok ? '' : r.error.message).toMatch(/with the other parts/);
  });
});
