import { closeSync, fstatSync, openSync, readFileSync, readSync } from 'node:fs';
import {
  analyzeCavity,
  BinaryStlStream,
  cavityFloorMm,
  curve,
  fillAt,
  mmPerUnit,
  pageSized,
  prepareMesh,
  prepareStreamedStl,
  readAnalysis,
  type CavityFill,
  type CavityModel,
  type CurvePoint,
  type Dam,
  type FileUnits,
  type MeshWarning,
  type StreamedStl,
  type TriangleSoup,
  type UpAxis,
} from '@gelpoint/mesh/cavity-engine';
import type { MouldFormat } from '@gelpoint/mesh/mould-file';
import { CliError, numberOption, parseOptions, type Command } from '../command';

const options = {
  units: { type: 'string' },
  up: { type: 'string' },
  level: { type: 'string' },
  dam: { type: 'string' },
  curve: { type: 'string' },
  json: { type: 'boolean' },
} as const;

// NIST SP 811, appendix B: 1 US fl oz = 29.5735295625 mL; 1 US gal = 231 in³ = 3.785411784 L.
const mm3PerMl = 1000;
const mlPerUsFluidOunce = 29.5735295625;
const mlPerUsGallon = 3785.411784;

interface MoldReport {
  format: MouldFormat;
  /** The units the file's numbers were read in. */
  units: FileUnits;
  /** The unit the file states (3MF); null for STL and OBJ. */
  fileUnits: FileUnits | null;
  triangles: number;
  watertight: boolean;
  bboxMm: { min: [number, number, number]; max: [number, number, number] };
  enclosedVolumeMm3: number | null;
  fill: {
    levelMm: number;
    dam: Dam;
    volumeMm3: number;
    wettedAreaMm2: number;
    maxDepthMm: number;
    trappedAirMm3: number;
    /** The cavity floor with this dam, in the file's frame, and the level as a height above it (what the web app's fill level means). */
    floorMm: number;
    levelAboveFloorMm: number;
  };
  curve?: CurvePoint[];
  method: CavityFill['method'];
  estimatedErrorPct: number;
  warnings: MeshWarning[];
}

function oneOf<T extends string>(value: string | undefined, flag: string, allowed: readonly T[], fallback: T): T {
  if (value === undefined) return fallback;
  if ((allowed as readonly string[]).includes(value)) return value as T;
  throw new CliError(`--${flag} must be ${allowed.join(', ').replace(/, ([^,]*)$/, ' or $1')}, got "${value}"`);
}

/** Four significant figures, without exponents: 15914, 252.6, 1.600, 0.0002526. */
function figures(value: number): string {
  if (value === 0) return '0';
  if (Math.abs(value) >= 1000) return value.toFixed(0);
  const decimals = Math.max(0, 3 - Math.floor(Math.log10(Math.abs(value))));
  return value.toFixed(Math.min(decimals, 12));
}

/** Units as people write them. */
const unitSymbol: Record<FileUnits, string> = { um: 'µm', mm: 'mm', cm: 'cm', m: 'm', in: 'in', ft: 'ft' };
const unitName: Record<FileUnits, string> = { um: 'microns', mm: 'millimetres', cm: 'centimetres', m: 'metres', in: 'inches', ft: 'feet' };
const formatName: Record<MouldFormat, string> = { stl: 'STL', '3mf': '3MF', obj: 'OBJ' };

function volumeText(volumeMm3: number, units: FileUnits): string {
  const ml = volumeMm3 / mm3PerMl;
  if (units === 'in' || units === 'ft') return `${figures(ml / mlPerUsFluidOunce)} US fl oz (${figures(ml / mlPerUsGallon)} US gal)`;
  return `${figures(ml)} mL (${figures(ml / 1000)} L)`;
}

function unitsText(report: MoldReport): string {
  const read = `${unitName[report.units]} (${unitSymbol[report.units]})`;
  if (report.fileUnits === null) return `${read}; ${formatName[report.format]} carries no unit`;
  if (report.fileUnits === report.units) return `${read}, as the file states`;
  return `${read}, as asked; the file states ${unitName[report.fileUnits]}`;
}

function readable(file: string, report: MoldReport, up: UpAxis): string {
  const units = report.units;
  const scale = mmPerUnit[units];
  const length = (mm: number): string => `${figures(mm / scale)} ${unitSymbol[units]}`;
  const area = (mm2: number): string => `${figures(mm2 / (scale * scale))} ${unitSymbol[units]}²`;
  const { min, max } = report.bboxMm;
  const f = report.fill;
  const lines = [
    `Cavity report for ${file}`,
    `  file          ${formatName[report.format]}, read in ${unitsText(report)}`,
    `  mesh          ${report.triangles} triangles, ${report.watertight ? 'watertight' : 'not watertight'}` +
      (report.enclosedVolumeMm3 === null ? '' : `, encloses ${volumeText(report.enclosedVolumeMm3, units)}`),
    `  size          ${[0, 1, 2].map((k) => length(max[k]! - min[k]!)).join(' × ')} (x × y × z, ${up === 'z' ? 'z up' : `file axis ${up} turned to point up`})`,
    `  fill level    ${length(f.levelMm)} (${f.dam === 'box' ? 'box dam around the bounding box' : 'dams along the outline'})`,
    `  cavity floor  ${length(f.floorMm)}: the level stands ${length(f.levelAboveFloorMm)} above it`,
    `  resin         ${volumeText(f.volumeMm3, units)}`,
    `  wetted area   ${area(f.wettedAreaMm2)} (floor and walls, for the seal coat)`,
    `  deepest       ${length(f.maxDepthMm)}`,
    `  trapped air   ${volumeText(f.trappedAirMm3, units)}`,
    `  method        ${report.method}, estimated error ${report.estimatedErrorPct.toPrecision(2)} %`,
  ];
  if (report.curve) {
    lines.push('  volume by level');
    for (const p of report.curve) lines.push(`    ${length(p.levelMm).padStart(14)}  ${volumeText(p.volumeMm3, units)}`);
  }
  for (const w of report.warnings) lines.push(`  caution: ${w.message}`);
  return lines.join('\n');
}

/**
 * gelpoint mold FILE: the cavity report of a mould file (STL, 3MF or OBJ, told apart by content) at
 * one level. The level is given in the file's units along its up axis, the same numbers the maker
 * reads in the CAD program. STL and OBJ carry no unit (mm unless --units says otherwise); a 3MF
 * states its own, which --units overrides. The report adds the cavity floor and the level's height
 * above it, the datum the web app and the API use.
 */
export const command: Command = async (argv) => {
  const { values, positionals } = parseOptions(argv, options, true);
  if (positionals.length !== 1)
    throw new CliError(
      positionals.length === 0 ? 'give the mould file, STL, 3MF or OBJ (gelpoint mold FILE --level L)' : `give one mould file, got ${positionals.length}`,
    );
  const file = positionals[0]!;
  const chosenUnits = values.units === undefined ? undefined : oneOf(values.units, 'units', ['mm', 'cm', 'in'] as const, 'mm');
  const up = oneOf(values.up, 'up', ['x', 'y', 'z'] as const, 'z');
  const dam = oneOf(values.dam, 'dam', ['outline', 'box'] as const, 'outline');
  const level = numberOption(values.level, 'level', { required: true })!;
  const curveCount = numberOption(values.curve, 'curve');
  if (curveCount !== undefined && (!Number.isInteger(curveCount) || curveCount < 2)) {
    throw new CliError(`--curve must be a whole number of levels, at least 2, got "${values.curve}"`);
  }

  const mould = await readMould(file);
  const units: FileUnits = chosenUnits ?? mould.fileUnits ?? 'mm';
  const levelMm = level * mmPerUnit[units];
  const mesh = unwrap(mould.streamed ? prepareStreamedStl(mould.streamed, { units, up }) : prepareMesh(mould.soup!, { units, up }));
  const a = unwrap(analyzeCavity(mesh, { levelsMm: [levelMm] }));
  const model: CavityModel = unwrap(readAnalysis(a));
  const fill = unwrap(fillAt(model, levelMm, dam));
  const floorMm = unwrap(cavityFloorMm(model, dam));
  const report: MoldReport = {
    format: mould.format,
    units,
    fileUnits: mould.fileUnits,
    triangles: a.triangles,
    watertight: a.watertight,
    bboxMm: a.bboxMm,
    enclosedVolumeMm3: a.enclosedVolumeMm3,
    fill: {
      levelMm: fill.levelMm,
      dam: fill.dam,
      volumeMm3: fill.volumeMm3,
      wettedAreaMm2: fill.wettedAreaMm2,
      maxDepthMm: fill.maxDepthMm,
      trappedAirMm3: fill.trappedAirMm3,
      floorMm,
      levelAboveFloorMm: fill.levelMm - floorMm,
    },
    ...(curveCount === undefined ? {} : { curve: unwrap(curve(model, curveCount, dam)) }),
    method: fill.method,
    estimatedErrorPct: fill.estimatedErrorPct,
    warnings: [...a.warnings, ...fill.warnings].map((w) => ({ code: w.code, message: w.message })),
  };
  return values.json ? JSON.stringify(report, null, 2) : readable(file, report, up);
};

/** Bytes read at a time: every fresh page costs, so one buffer (a single huge page) is filled again and again. */
const chunkBytes = 1 << 20;

interface ReadMould {
  format: MouldFormat;
  fileUnits: FileUnits | null;
  /** A binary STL welded as it was read… */
  streamed?: StreamedStl;
  /** …or any other file, read whole. */
  soup?: TriangleSoup;
}

/**
 * A binary STL is read in chunks into one buffer and welded as they come, so its tens of MB are
 * never held at once; any other file (or one the stream does not take) is read whole, by the
 * readers of every format, which are loaded only then.
 */
async function readMould(file: string): Promise<ReadMould> {
  let bytes: Uint8Array;
  try {
    const fd = openSync(file, 'r');
    try {
      const stat = fstatSync(fd);
      // Only a regular file's size is known before reading it; a pipe is read whole, untouched.
      // BinaryStlStream.open leaves anything it does not take (a file shorter than a header included) to the whole read.
      if (stat.isFile() && stat.size > 0) {
        const buffer = pageSized(Uint8Array, Math.min(chunkBytes, stat.size));
        let length = readSync(fd, buffer, 0, buffer.length, null);
        const stream = BinaryStlStream.open(buffer.subarray(0, length), stat.size);
        if (stream) {
          while (length > 0) {
            stream.push(buffer.subarray(0, length));
            length = readSync(fd, buffer, 0, buffer.length, null);
          }
          return { format: 'stl', fileUnits: null, streamed: unwrap(stream.finish()) };
        }
      }
      // A view, not a copy: the file can be tens of MB, and every fresh page costs.
      const whole = readFileSync(file);
      bytes = new Uint8Array(whole.buffer, whole.byteOffset, whole.byteLength);
    } finally {
      closeSync(fd);
    }
  } catch (err) {
    if (err instanceof CliError) throw err;
    const reason = err instanceof Error && 'code' in err ? String((err as NodeJS.ErrnoException).code) : 'unreadable';
    throw new CliError(`cannot read "${file}" (${reason}); check the path`);
  }
  const { readMouldFile } = await import('@gelpoint/mesh/mould-file');
  const mould = unwrap(readMouldFile(bytes, { consumeBytes: true }));
  return { format: mould.format, fileUnits: mould.fileUnits, soup: mould.soup };
}

function unwrap<T>(result: { ok: true; value: T } | { ok: false; error: { message: string } }): T {
  if (!result.ok) throw new CliError(result.error.message);
  return result.value;
}
