import type { FileUnits } from '../frame';
import { fail, ok, type Result } from '../result';
import { defaultMaxTriangles, type TriangleSoup } from '../stl/triangle-soup';
import { ArchiveBudget, defaultArchiveLimits, unpackEntry, unpackSmallEntry, type ArchiveLimits } from './archive-limits';
import { fileUnitsOf3mf, ModelPartReader, type ModelPart } from './model-part';
import { placeObjects } from './place-objects';
import { conventionalModelPart, startPartTarget } from './start-part';
import { partKey, readZipDirectory, type ZipEntry } from './zip-directory';

export interface Read3mfOptions {
  maxTriangles?: number;
  archiveLimits?: Partial<ArchiveLimits>;
}

export interface Read3mf {
  soup: TriangleSoup;
  /** The unit the file states (millimetre when it states none, as the core specification says). */
  fileUnits: FileUnits;
}

/** A relationships part is a short list; anything near this size is not one. */
const maxRelationshipsBytes = 2 ** 20;

/**
 * Reads a 3MF (3MF core specification): an OPC zip package whose root 3D Model part is named by
 * the StartPart relationship in `_rels/.rels` (§2.1.1), or sits at the conventional
 * `3D/3dmodel.model` (§2.2) when a writer left the relationship out. Model parts the Production
 * extension refers to are read too. Every part is unpacked under the archive limits.
 */
export function read3mf(bytes: Uint8Array, options: Read3mfOptions = {}): Result<Read3mf> {
  const maxTriangles = options.maxTriangles ?? defaultMaxTriangles;
  const budget = new ArchiveBudget({ ...defaultArchiveLimits, ...options.archiveLimits });
  const directory = readZipDirectory(bytes);
  if (!directory.ok) return directory;
  const entries = directory.value;

  let rootKey: string | null = null;
  const rels = entries.get('_rels/.rels');
  if (rels) {
    const xml = unpackSmallEntry(bytes, rels, budget, maxRelationshipsBytes);
    if (!xml.ok) return xml;
    const target = startPartTarget(xml.value);
    if (!target.ok) return target;
    if (target.value !== null) {
      rootKey = partKey(target.value);
      if (!entries.has(rootKey)) {
        return fail(
          'threemf_no_model',
          `The 3MF names "${target.value.slice(0, 80)}" as its model, but the file does not hold that part; export the mould again and upload the whole file.`,
        );
      }
    }
  }
  rootKey ??= entries.has(partKey(conventionalModelPart)) ? partKey(conventionalModelPart) : null;
  if (rootKey === null) return notA3mf(entries);

  const limits = { maxTriangles, maxVertices: Math.max(1024, 3 * maxTriangles) };
  const readPart = (entry: ZipEntry): Result<ModelPart> => {
    const reader = new ModelPartReader(entry.name.slice(0, 80), limits);
    const unpacked = unpackEntry(bytes, entry, budget, (chunk) => reader.write(chunk));
    if (!unpacked.ok) return unpacked;
    return reader.finish();
  };

  const root = readPart(entries.get(rootKey)!);
  if (!root.ok) return root;
  const parts = new Map<string, ModelPart>([['', root.value]]);
  // The Production extension lets the root model's items and components name other model parts.
  const referenced = new Set<string>();
  for (const ref of root.value.build) if (ref.path) referenced.add(ref.path);
  for (const object of root.value.objects.values()) for (const c of object.components ?? []) if (c.path) referenced.add(c.path);
  for (const path of referenced) {
    const key = partKey(path);
    if (parts.has(key)) continue;
    if (key === rootKey) {
      parts.set(key, root.value);
      continue;
    }
    const entry = entries.get(key);
    if (!entry) continue;
    const part = readPart(entry);
    if (!part.ok) return part;
    parts.set(key, part.value);
  }

  const placed = placeObjects(parts, (path) => (partKey(path) === rootKey ? '' : partKey(path)), maxTriangles);
  if (!placed.ok) return placed;
  return ok({
    soup: { positions: placed.value.positions, triangleCount: placed.value.triangleCount, format: '3mf', warnings: placed.value.warnings },
    fileUnits: fileUnitsOf3mf[root.value.unit],
  });
}

function notA3mf(entries: Map<string, ZipEntry>): Result<never> {
  const inside = [...entries.values()].map((e) => e.name).find((name) => /\.(stl|obj|3mf)$/i.test(name));
  if (inside) {
    return fail('file_not_mould', `The file is a zip archive holding "${inside.slice(0, 80)}", not a 3MF; unzip it and upload the mould file inside.`);
  }
  return fail(
    'threemf_no_model',
    'The file is a zip archive without a 3D model part, so it is not a 3MF; export the mould as 3MF, STL or OBJ and upload that file.',
  );
}
