import { type Result } from '../result';
import type { TriangleSoup } from './triangle-soup';
export declare const binaryHeaderBytes = 84;
export declare const binaryRecordBytes = 50;
/** The triangle count a binary STL announces in bytes 80..83, or null when the header is incomplete. */
export declare function announcedTriangleCount(bytes: Uint8Array): number | null;
/** What the size of a file says about it as a binary STL. */
export interface BinaryLayout {
  /** The count in the header. */
  announced: number;
  /** Whole 50-byte records after the header. */
  records: number;
  /** Bytes after the last whole record (0..49). */
  trailing: number;
}
export declare function binaryLayout(bytes: Uint8Array): BinaryLayout | null;
/** True when the header's count and the file's size agree exactly (the size rule of binary STL). */
export declare function isExactBinary(layout: BinaryLayout | null): boolean;
/**
 * Reads a binary STL as its writer left it. Many writers stream the records and never go back to
 * fill in the count (it stays 0) or write a wrong one, and some add a byte or a line ending after
 * the last record, so the records are counted from the file's size: the header's count is only
 * believed when it agrees. A file cut short inside a record is refused, since its end is lost.
 */
export declare function parseBinaryStl(bytes: Uint8Array, maxTriangles: number): Result<TriangleSoup>;
