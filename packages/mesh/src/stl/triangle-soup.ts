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
  /**
   * Set when the corners were read in place (consumeBytes): the bytes the caller gave up, which
   * hold them. The soup is spent once prepareMesh has welded it, and the mesh carries these bytes
   * on as memory the analysis may use for its working arrays.
   */
  spareBytes?: Uint8Array;
}

export interface ParseStlOptions {
  /** Refuse files with more triangles than this (memory guard for uploads). Default 5,000,000. */
  maxTriangles?: number;
  /**
   * The reader may overwrite the bytes it is given: a binary STL's corners are then gathered in
   * place (each 50-byte record's 36 bytes of corners moved to the front), so the soup is a view of
   * the file instead of a second array nearly its size. For callers that read the file only to
   * analyse it; the bytes are garbage afterwards, and the soup lives as long as they do and serves
   * one prepareMesh only (see TriangleSoup.spareBytes).
   */
  consumeBytes?: boolean;
}

export const defaultMaxTriangles = 5_000_000;
