/** Test plumbing: generated mould → STL bytes → parsed, prepared and analysed, failing loudly. */
import { analyzeCavity, type AnalyzeCavityOptions } from '../src/analyze-cavity';
import type { CavityAnalysis } from '../src/cavity-analysis';
import { prepareMesh, type CavityMesh, type PrepareMeshOptions } from '../src/prepare-mesh';
import type { Result } from '../src/result';
import { encodeStlBinary } from '../src/stl/encode-stl';
import { parseStl } from '../src/stl/parse-stl';
import type { GeneratedMesh } from './moulds';

export function unwrap<T>(result: Result<T>): T {
  if (!result.ok) throw new Error(`${result.error.code}: ${result.error.message}`);
  return result.value;
}

export function meshOf(generated: GeneratedMesh, options: PrepareMeshOptions = {}): CavityMesh {
  return unwrap(prepareMesh(unwrap(parseStl(encodeStlBinary(generated))), options));
}

export function analysisOf(generated: GeneratedMesh, options: AnalyzeCavityOptions & PrepareMeshOptions = {}): CavityAnalysis {
  return unwrap(analyzeCavity(meshOf(generated, options), options));
}

/** Relative difference |a − b| / |b|. */
export function relative(a: number, b: number): number {
  return Math.abs(a - b) / Math.abs(b);
}
