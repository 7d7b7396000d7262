/**
 * The mesh engine never throws for bad input: a file from a stranger's CAD program is input, and
 * every refusal is a value the API, the CLI and the browser can show as it is.
 */
export type MeshErrorCode =
  | 'file_empty'
  | 'file_not_mould'
  | 'stl_empty'
  | 'stl_truncated'
  | 'stl_not_stl'
  | 'stl_non_finite'
  | 'stl_too_many_triangles'
  | 'stl_no_triangles'
  | 'threemf_invalid'
  | 'threemf_no_model'
  | 'threemf_unsupported'
  | 'threemf_too_large'
  | 'threemf_compression_ratio'
  | 'obj_invalid'
  | 'obj_no_faces'
  | 'too_many_triangles'
  | 'mesh_degenerate'
  | 'option_invalid'
  | 'level_invalid'
  | 'levels_not_ascending'
  | 'dam_invalid'
  | 'analysis_invalid'
  | 'analysis_outdated';
export interface MeshError {
  /** Stable snake_case code for programs. */
  code: MeshErrorCode;
  /** A sentence for people: what was wrong and how to fix it. */
  message: string;
}
export type Result<T> =
  | {
      ok: true;
      value: T;
    }
  | {
      ok: false;
      error: MeshError;
    };
export declare function ok<T>(value: T): Result<T>;
export declare function fail<T = never>(code: MeshErrorCode, message: string): Result<T>;
export type MeshWarningCode =
  | 'stl_count_mismatch'
  | 'stl_trailing_bytes'
  | 'threemf_objects_skipped'
  | 'zero_area_triangles_dropped'
  | 'duplicate_triangles_dropped'
  | 'vertices_welded'
  | 'inverted_normals_fixed'
  | 'inconsistent_winding_fixed'
  | 'open_mesh'
  | 'non_manifold_edges'
  | 'degenerate_triangles_dropped'
  | 'trapped_air'
  | 'accuracy_target_missed';
/** Something the maker should know; the numbers are still given. */
export interface MeshWarning {
  code: MeshWarningCode;
  message: string;
}
