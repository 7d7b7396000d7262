/**
 * STL writers: the engine hands cleaned meshes back to other programs, and tests write the same
 * mesh both ways. Normals are written from the corners' winding (right-hand rule).
 */
export interface StlSource {
  /** Nine coordinates per triangle. */
  positions: ArrayLike<number>;
  triangleCount: number;
}
/** Binary STL; `header` (at most 80 ASCII characters) may begin with "solid", as many exporters do. */
export declare function encodeStlBinary(source: StlSource, header?: string): Uint8Array;
export interface AsciiStlOptions {
  solidName?: string;
  lineEnding?: '\n' | '\r\n';
}
/** Writes float32-rounded coordinates with 9 significant digits, enough to read back bit for bit. */
export declare function encodeStlAscii(source: StlSource, options?: AsciiStlOptions): string;
