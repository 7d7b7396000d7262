import { analyzeCavity, type AnalyzeCavityOptions } from './analyze-cavity';
import type { CavityAnalysis } from './cavity-analysis';
import type { FileUnits } from './frame';
import { readMouldFile, type MouldFormat, type ReadMouldFileOptions } from './mould-file';
import { prepareMesh, type PrepareMeshOptions } from './prepare-mesh';
import { ok, type Result } from './result';

export type AnalyzeStlOptions = ReadMouldFileOptions & PrepareMeshOptions & AnalyzeCavityOptions;

export interface MouldFileAnalysis {
  analysis: CavityAnalysis;
  format: MouldFormat;
  /** The units the numbers were read in: the caller's, else the file's own (3MF), else mm. */
  units: FileUnits;
  /** The unit the file states (3MF); null for formats that carry none. */
  fileUnits: FileUnits | null;
}

/**
 * Bytes of a mould file (STL, 3MF or OBJ) in, stored analysis out: the whole job of the analysis
 * worker in one call. Units given in the options win over a 3MF's own.
 */
export function analyzeMouldFile(bytes: Uint8Array, options: AnalyzeStlOptions = {}): Result<MouldFileAnalysis> {
  const file = readMouldFile(bytes, options);
  if (!file.ok) return file;
  const units = options.units ?? file.value.fileUnits ?? 'mm';
  const mesh = prepareMesh(file.value.soup, { ...options, units });
  if (!mesh.ok) return mesh;
  const analysis = analyzeCavity(mesh.value, options);
  if (!analysis.ok) return analysis;
  return ok({ analysis: analysis.value, format: file.value.format, units, fileUnits: file.value.fileUnits });
}

/** The same for callers that only want the analysis; any of the three formats is read. */
export function analyzeStl(bytes: Uint8Array, options: AnalyzeStlOptions = {}): Result<CavityAnalysis> {
  const read = analyzeMouldFile(bytes, options);
  return read.ok ? ok(read.value.analysis) : read;
}
