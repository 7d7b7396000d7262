import { analyzeCavity, type AnalyzeCavityOptions } from './analyze-cavity';
import type { CavityAnalysis } from './cavity-analysis';
import { prepareMesh, type PrepareMeshOptions } from './prepare-mesh';
import type { Result } from './result';
import { parseStl } from './stl/parse-stl';
import type { ParseStlOptions } from './stl/triangle-soup';

export type AnalyzeStlOptions = ParseStlOptions & PrepareMeshOptions & AnalyzeCavityOptions;

/** Bytes of an STL in, stored analysis out: the whole job of the analysis worker in one call. */
export function analyzeStl(bytes: Uint8Array, options: AnalyzeStlOptions = {}): Result<CavityAnalysis> {
  const soup = parseStl(bytes, options);
  if (!soup.ok) return soup;
  const mesh = prepareMesh(soup.value, options);
  if (!mesh.ok) return mesh;
  return analyzeCavity(mesh.value, options);
}
