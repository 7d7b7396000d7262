/**
 * The mesh engine never throws for bad input: a file from a stranger's CAD program is input, and
 * every refusal is a value the API, the CLI and the browser can show as it is.
 */
export type MeshErrorCode =
  | 'stl_empty'
  | 'stl_truncated'
  | 'stl_not_stl'
  | 'stl_non_finite'
  | 'stl_too_many_triangles'
  | 'stl_no_triangles'
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

export type Result<T> = { ok: true; value: T } | { ok: false; error: MeshError };

export function ok<T>(value: T): Result<T> {
  return { ok: true, value };
}

export function fail<T = never>(code: MeshErrorCode, message: string): Result<T> {
  return { ok: false, error: { code, message } };
}

export type MeshWarningCode =
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
