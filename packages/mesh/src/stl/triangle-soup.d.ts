import type { MeshWarning } from '../result';
/** Triangles as a file holds them: no shared corners yet, the file's own units and axes. */
export interface TriangleSoup {
  /** Nine coordinates per triangle (x, y, z of its three corners), float32 as STL stores them. */
  positions: Float32Array;
  triangleCount: number;
  /** How the triangles were written: binary or ASCII STL, or a 3MF or OBJ file. */
  format: 'binary' | 'ascii' | '3mf' | 'obj';
  /** What the reader had to overlook to read the file (a wrong count, stray bytes…). */
  warnings: MeshWarning[];
}
export interface ParseStlOptions {
  /** Refuse files with more triangles than this (memory guard for uploads). Default 5,000,000. */
  maxTriangles?: number;
}
export declare const defaultMaxTriangles = 5000000;
