/**
 * The cavity engine without the file readers: a binary STL streamed in, the mesh prepared, the
 * analysis and its fill questions. What `gelpoint mold` needs for the usual file, so the readers of
 * the other formats (and their XML, zip and polygon libraries) load only for another file
 * (`@gelpoint/mesh/mould-file`). The package's index exports all of it too.
 */
export { BinaryStlStream, type StreamedStl } from './stl/binary-stl-stream';
export type { TriangleSoup } from './stl/triangle-soup';
export { mmPerUnit, type FileUnits, type UpAxis } from './frame';
export { pageSized } from './page-sized';
export { prepareMesh, prepareStreamedStl } from './prepare-mesh';
export { analyzeCavity } from './analyze-cavity';
export { readAnalysis } from './analysis-codec';
export { fillAt, curve } from './fill-queries';
export { cavityFloorMm } from './cavity-floor';
export type { Dam } from './dam';
export type { CavityFill, CavityModel, CurvePoint } from './cavity-analysis';
export type { MeshWarning } from './result';
