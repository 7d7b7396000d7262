import { mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyzeMouldFile, encodeStlAscii, encodeStlBinary, fillAt, readAnalysis, readMouldFile } from '@gelpoint/mesh';
import { beforeAll, describe, expect, it } from 'vitest';
import { encode3mf, encodeObj, stlWithCount } from '../../../../packages/mesh/test/mould-files';
import { cellSolid, mapped, recessedChamberBlock, revolvedPocketBlock } from '../../../../packages/mesh/test/moulds';
import { CliError } from '../command';
import { command } from './mold';

// A 32 × 24 × 12 mm block with a 20 × 16 mm pocket from z = 5 up: at 10 mm it holds
// 20 × 16 × 5 = 1600 mm³ on a wetted 20 × 16 floor plus 2 × (20 + 16) × 5 of walls.
const pocket = cellSolid([0, 6, 26, 32], [0, 4, 20, 24], [0, 5, 12], (i, j, k) => !(i === 1 && j === 1 && k === 1));
const expectedVolume = 20 * 16 * 5;
const expectedWetted = 20 * 16 + 2 * (20 + 16) * 5;

let dir = '';
const files: Record<string, string> = {};
let gridBytes: Uint8Array = new Uint8Array(0);
let nanBytes: Uint8Array = new Uint8Array(0);
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'gelpoint-mold-'));
  const write = async (name: string, bytes: Uint8Array | string): Promise<void> => {
    files[name] = join(dir, name);
    await writeFile(files[name]!, bytes);
  };
  await write('pocket.stl', encodeStlBinary(pocket, 'solid pocket'));
  await write('pocket-ascii.stl', encodeStlAscii(pocket, { lineEnding: '\r\n' }));
  // The same pocket drawn in inches with y up: file (x, y, z) = (x, z, −y) / 25.4 (NIST SP 811).
  await write('pocket-in-yup.stl', encodeStlBinary(mapped(pocket, (x, y, z) => [x / 25.4, z / 25.4, -y / 25.4])));
  await write(
    'bowl.stl',
    encodeStlBinary(
      revolvedPocketBlock({
        halfSide: 15,
        bottomZ: 0,
        topZ: 20,
        profile: [
          [0, 12],
          [6, 12],
          [10, 20],
        ],
        segments: 64,
      }),
    ),
  );
  await write('broken.stl', encodeStlBinary(pocket).subarray(0, 300));
  // A pocket block cut into many cells: over 2 MB, so the command reads it in several 1 MB chunks.
  const grid = Array.from({ length: 111 }, (_, i) => i);
  gridBytes = encodeStlBinary(cellSolid(grid, grid, [0, 4, 10], (i, j, k) => !(k === 1 && i >= 5 && i < 105 && j >= 5 && j < 105)));
  await write('grid.stl', gridBytes);
  const nan = encodeStlBinary(pocket);
  new DataView(nan.buffer).setFloat32(84 + 50 * 6 + 12 + 20, Number.NaN, true);
  nanBytes = nan;
  await write('nan.stl', nan);
  await write('empty.stl', new Uint8Array(0));
  // The same pocket as a 3MF that states inches (NIST SP 811: 1 in = 25.4 mm), as an OBJ of quads,
  // and as a binary STL whose writer left the triangle count at 0.
  await write('pocket-in.3mf', encode3mf(pocket, 'inch', 25.4));
  await write('pocket.obj', encodeObj(pocket, { quads: true, negative: true }));
  await write('pocket-count0.stl', stlWithCount(pocket, 0));
  await write('broken.3mf', encode3mf(pocket).subarray(0, 500));
  // A shaft into a wider chamber whose ceiling has a 5 × 5 × 2 mm recess away from the shaft:
  // resin fills the chamber, the recess holds its air (cuboid, CRC: 50 mm³).
  await write('undercut.stl', encodeStlBinary(recessedChamberBlock()));
});

interface Report {
  format: string;
  units: string;
  fileUnits: string | null;
  triangles: number;
  watertight: boolean;
  bboxMm: { min: number[]; max: number[] };
  enclosedVolumeMm3: number | null;
  fill: {
    levelMm: number;
    dam: string;
    volumeMm3: number;
    wettedAreaMm2: number;
    maxDepthMm: number;
    trappedAirMm3: number;
    floorMm: number;
    levelAboveFloorMm: number;
  };
  curve?: { levelMm: number; volumeMm3: number }[];
  method: string;
  estimatedErrorPct: number;
  warnings: { code: string; message: string }[];
}

async function json(argv: string[]): Promise<Report> {
  return JSON.parse(await command([...argv, '--json'])) as Report;
}

describe('gelpoint mold --json', () => {
  it('reads a binary STL of several MB in chunks to the report of the whole file read at once', async () => {
    expect(gridBytes.length).toBeGreaterThan(2 * 1024 * 1024);
    const out = await json([files['grid.stl']!, '--level', '9', '--dam', 'box']);
    const whole = analyzeMouldFile(gridBytes.slice(), { levelsMm: [9] });
    if (!whole.ok) throw new Error(whole.error.message);
    const model = readAnalysis(whole.value.analysis);
    if (!model.ok) throw new Error(model.error.message);
    const fill = fillAt(model.value, 9, 'box');
    if (!fill.ok) throw new Error(fill.error.message);
    expect(out.triangles).toBe(whole.value.analysis.triangles);
    expect(out.enclosedVolumeMm3).toBe(whole.value.analysis.enclosedVolumeMm3);
    expect(out.fill.volumeMm3).toBe(fill.value.volumeMm3);
    expect(out.fill.wettedAreaMm2).toBe(fill.value.wettedAreaMm2);
    // A 100 × 100 mm pocket from z = 4, filled to 9: 100 × 100 × 5 mm³.
    expect(out.fill.volumeMm3).toBeCloseTo(100 * 100 * 5, 6);
  });

  it('prints exactly the report fields', async () => {
    const out = await json([files['pocket.stl']!, '--level', '10']);
    expect(Object.keys(out)).toEqual([
      'format',
      'units',
      'fileUnits',
      'triangles',
      'watertight',
      'bboxMm',
      'enclosedVolumeMm3',
      'fill',
      'method',
      'estimatedErrorPct',
      'warnings',
    ]);
    expect(out).toMatchObject({ format: 'stl', units: 'mm', fileUnits: null });
    expect(Object.keys(out.fill)).toEqual(['levelMm', 'dam', 'volumeMm3', 'wettedAreaMm2', 'maxDepthMm', 'trappedAirMm3', 'floorMm', 'levelAboveFloorMm']);
    expect(out.triangles).toBe(pocket.triangleCount);
    expect(out.watertight).toBe(true);
    expect(out.bboxMm).toEqual({ min: [0, 0, 0], max: [32, 24, 12] });
    expect(out.enclosedVolumeMm3).toBeCloseTo(32 * 24 * 12 - 20 * 16 * 7, 6);
    // The pocket's floor stands at z = 5 in the file: a level of 10 is 5 mm of resin above it.
    expect(out.fill).toMatchObject({ levelMm: 10, dam: 'outline', floorMm: 5, levelAboveFloorMm: 5 });
    expect(out.fill.volumeMm3).toBeCloseTo(expectedVolume, 6);
    expect(out.fill.wettedAreaMm2).toBeCloseTo(expectedWetted, 6);
    expect(out.fill.maxDepthMm).toBeCloseTo(5, 9);
    expect(out.fill.trappedAirMm3).toBe(0);
    expect(out.method).toBe('exact');
    expect(out.warnings).toEqual([]);
  });

  it('reads the level in the file’s units along its up axis: inches, y up', async () => {
    const out = await json([files['pocket-in-yup.stl']!, '--units', 'in', '--up', 'y', '--level', String(10 / 25.4)]);
    expect(out.fill.levelMm).toBeCloseTo(10, 9);
    expect(out.fill.volumeMm3).toBeCloseTo(expectedVolume, 3);
    expect(out.bboxMm.max[2]! - out.bboxMm.min[2]!).toBeCloseTo(12, 4);
  });

  it('gives the same answer for the ASCII file, and the curve when asked', async () => {
    const ascii = await json([files['pocket-ascii.stl']!, '--level', '10', '--curve', '5', '--dam', 'box']);
    const binary = await json([files['pocket.stl']!, '--level', '10', '--dam', 'box']);
    expect(ascii.fill).toEqual(binary.fill);
    expect(ascii.curve).toHaveLength(5);
    expect(ascii.curve![4]).toEqual({ levelMm: 12, volumeMm3: expect.closeTo(20 * 16 * 7, 6) });
    expect(ascii.curve![0]!.volumeMm3).toBe(0);
  });

  it('reads a 3MF in the unit it states, without --units: the level in inches', async () => {
    const out = await json([files['pocket-in.3mf']!, '--level', String(10 / 25.4)]);
    expect(out).toMatchObject({ format: '3mf', units: 'in', fileUnits: 'in' });
    expect(out.fill.levelMm).toBeCloseTo(10, 9);
    expect(out.fill.volumeMm3).toBeCloseTo(expectedVolume, 2);
    expect(out.bboxMm.max[0]! - out.bboxMm.min[0]!).toBeCloseTo(32, 4);
  });

  it('lets --units override a 3MF’s own unit', async () => {
    const out = await json([files['pocket-in.3mf']!, '--units', 'mm', '--level', String(10 / 25.4)]);
    expect(out).toMatchObject({ format: '3mf', units: 'mm', fileUnits: 'in' });
    expect(out.bboxMm.max[0]! - out.bboxMm.min[0]!).toBeCloseTo(32 / 25.4, 5);
  });

  it('gives the same fill for the OBJ and for the STL whose count is 0, and says so', async () => {
    const binary = await json([files['pocket.stl']!, '--level', '10']);
    const obj = await json([files['pocket.obj']!, '--level', '10']);
    const count0 = await json([files['pocket-count0.stl']!, '--level', '10']);
    expect(obj).toMatchObject({ format: 'obj', units: 'mm', fileUnits: null });
    expect(obj.fill).toEqual(binary.fill);
    expect(count0.fill).toEqual(binary.fill);
    expect(count0.warnings.map((w) => w.code)).toEqual(['stl_count_mismatch']);
  });

  it('warns about air held in a recess of an overhang’s ceiling, and fills under the overhang', async () => {
    const out = await json([files['undercut.stl']!, '--level', '20']);
    expect(out.method).toBe('exact');
    expect(out.fill.trappedAirMm3).toBeCloseTo(50, 6);
    // Chamber 30 × 30 × 5 and shaft 10 × 10 × 10.
    expect(out.fill.volumeMm3).toBeCloseTo(5500, 6);
    expect(out.warnings.map((w) => w.code)).toContain('trapped_air');
  });
});

describe('gelpoint mold, readable', () => {
  it('names the format and the unit the numbers were read in', async () => {
    expect(await command([files['pocket.stl']!, '--level', '10'])).toMatch(/file +STL, read in millimetres \(mm\); STL carries no unit/);
    expect(await command([files['pocket-in.3mf']!, '--level', '0.4'])).toMatch(/file +3MF, read in inches \(in\), as the file states/);
    expect(await command([files['pocket-in.3mf']!, '--level', '10', '--units', 'mm'])).toMatch(
      /file +3MF, read in millimetres \(mm\), as asked; the file states inches/,
    );
    expect(await command([files['pocket.obj']!, '--level', '10', '--units', 'cm'])).toMatch(/file +OBJ, read in centimetres \(cm\); OBJ carries no unit/);
  });

  it('reports millilitres and litres for a metric file', async () => {
    const text = await command([files['pocket.stl']!, '--level', '10']);
    const [, ml, litres] = /resin +([\d.]+) mL \(([\d.]+) L\)/.exec(text) ?? [];
    expect(Number(ml)).toBeCloseTo(expectedVolume / 1000, 3);
    expect(Number(litres)).toBeCloseTo(expectedVolume / 1e6, 6);
    expect(text).toMatch(/fill level +10\.00 mm/);
    expect(text).toMatch(/cavity floor +5\.000 mm: the level stands 5\.000 mm above it/);
  });

  it('measures the level of a bowl blank in the file’s frame, and says how far above the bowl’s bottom it is', async () => {
    // A 30 × 30 × 20 block whose pocket floor is at z = 12: a level of 16 is 4 mm of resin.
    const out = await json([files['bowl.stl']!, '--level', '16']);
    expect(out.fill.floorMm).toBe(12);
    expect(out.fill.levelAboveFloorMm).toBe(4);
    expect(out.fill.maxDepthMm).toBeCloseTo(4, 9);
  });

  it('reports US fluid ounces and gallons for a file in inches (NIST SP 811)', async () => {
    const text = await command([files['pocket-in-yup.stl']!, '--units', 'in', '--up', 'y', '--level', String(10 / 25.4)]);
    // 1600 mm³ = 1.6 mL = 1.6 / 29.5735295625 US fl oz = 1.6 / 3785.411784 US gal.
    const [, ounces, gallons] = /resin +([\d.]+) US fl oz \(([\d.]+) US gal\)/.exec(text) ?? [];
    expect(Number(ounces)).toBeCloseTo(1.6 / 29.5735295625, 4);
    expect(Number(gallons)).toBeCloseTo(1.6 / 3785.411784, 7);
    expect(text).toMatch(/fill level +0\.3937 in/);
    expect(text).toContain('in²');
  });
});

describe('gelpoint mold, bad input', () => {
  const failure = async (argv: string[]): Promise<string> => {
    try {
      await command(argv);
    } catch (err) {
      expect(err).toBeInstanceOf(CliError);
      expect((err as Error).message).not.toContain('\n');
      return (err as Error).message;
    }
    throw new Error('expected a CliError');
  };

  it('names the problem in one line', async () => {
    expect(await failure([join(dir, 'missing.stl'), '--level', '3'])).toMatch(/cannot read .*missing\.stl.*ENOENT/);
    expect(await failure([files['broken.stl']!, '--level', '3'])).toMatch(/cut short/);
    expect(await failure([files['pocket.stl']!, '--level', 'ten'])).toMatch(/--level must be a number/);
    expect(await failure([files['pocket.stl']!])).toMatch(/--level is required/);
    expect(await failure([files['pocket.stl']!, '--level', '3', '--colour', 'red'])).toMatch(/colour/);
    expect(await failure([files['pocket.stl']!, '--level', '3', '--units', 'ft'])).toMatch(/--units must be mm, cm or in/);
    expect(await failure([files['pocket.stl']!, '--level', '3', '--curve', '1'])).toMatch(/--curve/);
    expect(await failure(['--level', '3'])).toMatch(/mould file, STL, 3MF or OBJ/);
    expect(await failure([files['broken.3mf']!, '--level', '3'])).toMatch(/^The 3MF's zip structure is damaged/);
    expect(await failure([files['empty.stl']!, '--level', '3'])).toMatch(/^The file is empty/);
    expect(await failure([dir, '--level', '3'])).toMatch(/cannot read .*EISDIR/);
  });

  it('refuses a corner that is not a number with the sentence of the whole-file reader', async () => {
    const whole = readMouldFile(nanBytes.slice());
    expect(whole.ok).toBe(false);
    if (!whole.ok) expect(await failure([files['nan.stl']!, '--level', '3'])).toBe(whole.error.message);
  });
});
