export { parseStl } from './stl/parse-stl';
export { defaultMaxTriangles, type ParseStlOptions, type TriangleSoup } from './stl/triangle-soup';
export { encodeStlAscii, encodeStlBinary, type AsciiStlOptions, type StlSource } from './stl/encode-stl';
export { mmPerUnit, type FileUnits, type UpAxis } from './frame';
export { prepareMesh, type CavityMesh, type MeshTopologyReport, type PrepareMeshOptions } from './prepare-mesh';
export type { BoundingBox } from './mesh-measures';
export { analyzeCavity, analysisDefaults, type AnalyzeCavityOptions } from './analyze-cavity';
export { analyzeStl, type AnalyzeStlOptions } from './analyze-stl';
export { readAnalysis } from './analysis-codec';
export { cavityAnalysisVersion } from './cavity-analysis';
export { fillAt, curve, layerVolumes, type CavitySource } from './fill-queries';
export { cavityFloorMm } from './cavity-floor';
export { fillRecord, type FillRecord } from './fill-record';
export type { Dam } from './dam';
export type {
  CavityAnalysis, CavityFill, CavityMethod, CavityModel, CurvePoint, DepthMap, ExactFacts, MethodFigures,
  StoredColumnGrid, StoredLevelSeries,
} from './cavity-analysis';
export type { MeshError, MeshErrorCode, MeshWarning, MeshWarningCode, Result } from './result';
