export { parseStl } from './stl/parse-stl';
export { BinaryStlStream, type BinaryStlStreamOptions, type StreamedStl } from './stl/binary-stl-stream';
export { readMouldFile, detectMouldFormat, type MouldFile, type MouldFormat, type ReadMouldFileOptions } from './mould-file';
export { read3mf, type Read3mf, type Read3mfOptions } from './threemf/read-3mf';
export { archiveLimitsFor, defaultArchiveLimits, type ArchiveLimits } from './threemf/archive-limits';
export { parseObj, type ParseObjOptions } from './obj/parse-obj';
export { defaultMaxTriangles, type ParseStlOptions, type TriangleSoup } from './stl/triangle-soup';
export { encodeStlAscii, encodeStlBinary, type AsciiStlOptions, type StlSource } from './stl/encode-stl';
export { fileUnitsList, mmPerUnit, type ChosenUnits, type FileUnits, type UpAxis } from './frame';
export { prepareMesh, prepareStreamedStl, relativeWeldTolerance, type CavityMesh, type MeshTopologyReport, type PrepareMeshOptions } from './prepare-mesh';
export type { BoundingBox } from './mesh-measures';
export { analyzeCavity, analysisDefaults, type AnalyzeCavityOptions } from './analyze-cavity';
export { analyzeMouldFile, analyzeStl, type AnalyzeStlOptions, type MouldFileAnalysis } from './analyze-stl';
export { readAnalysis } from './analysis-codec';
export { cavityAnalysisVersion } from './cavity-analysis';
export { fillAt, curve, layerVolumes, type CavitySource } from './fill-queries';
export { cavityFloorMm } from './cavity-floor';
export { planCavityFacts, PLAN_CURVE_POINTS, type PlanCavityFacts } from './plan-cavity-facts';
export { fillRecord, type DepthMapRecord, type FillRecord } from './fill-record';
export { cavityReport, storedAnalysisJson, type CavityReportRecord, type StoredAnalysisJson, type StoredCavityReport } from './cavity-report';
export { readMouldForAnalysis, type MouldForAnalysis } from './read-for-analysis';
export type { Dam } from './dam';
export type {
  CavityAnalysis,
  CavityFill,
  CavityMethod,
  CavityModel,
  CurvePoint,
  DepthMap,
  ExactFacts,
  MethodFigures,
  StoredColumnGrid,
  StoredLevelSeries,
} from './cavity-analysis';
export type { MeshError, MeshErrorCode, MeshWarning, MeshWarningCode, Result } from './result';
