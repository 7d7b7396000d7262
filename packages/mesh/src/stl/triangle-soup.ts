/** Triangles as a file holds them: no shared corners yet, the file's own units and axes. */
export interface TriangleSoup {
  /** Nine coordinates per triangle (x, y, z of its three corners), float32 as STL stores them. */
  positions: Float32Array;
  triangleCount: number;
  format: 'binary' | 'ascii';
}

export interface ParseStlOptions {
  /** Refuse files with more triangles than this (memory guard for uploads). Default 5,000,000. */
  maxTriangles?: number;
}

export const defaultMaxTriangles = 5_000_000;
