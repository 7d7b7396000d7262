import type { MoldWarning } from '../types';

export interface WarningNote {
  code: string;
  title: string;
  message: string;
  /** 'fixed' for problems the analysis already repaired; 'check' for what the maker should look at. */
  kind: 'check' | 'fixed';
}

const titles: Record<string, { title: string; kind: WarningNote['kind'] }> = {
  open_mesh: { title: 'The mesh has holes', kind: 'check' },
  non_manifold_edges: { title: 'Some edges belong to more than two faces', kind: 'check' },
  trapped_air: { title: 'Air would be trapped', kind: 'check' },
  accuracy_target_missed: { title: 'Less exact than usual', kind: 'check' },
  inverted_normals_fixed: { title: 'The faces pointed inwards and were turned', kind: 'fixed' },
  inconsistent_winding_fixed: { title: 'Some faces were turned to match their neighbours', kind: 'fixed' },
  degenerate_triangles_dropped: { title: 'Collapsed triangles were left out', kind: 'fixed' },
  zero_area_triangles_dropped: { title: 'Triangles without area were left out', kind: 'fixed' },
  duplicate_triangles_dropped: { title: 'Triangles written twice were left out', kind: 'fixed' },
  vertices_welded: { title: 'Hairline gaps were closed', kind: 'fixed' },
  stl_count_mismatch: { title: 'The file’s triangle count was wrong', kind: 'fixed' },
  stl_trailing_bytes: { title: 'Stray bytes at the end of the file were ignored', kind: 'fixed' },
  threemf_objects_skipped: { title: 'Support objects were left out', kind: 'fixed' },
};

/**
 * The report's warnings about the mesh and the fill's warnings about this level, once each (the
 * fill's sentence wins, since it speaks about the chosen level), things to check before repairs.
 */
export function warningNotes(reportWarnings: readonly MoldWarning[], fillWarnings: readonly MoldWarning[]): WarningNote[] {
  const byCode = new Map<string, MoldWarning>();
  for (const warning of [...reportWarnings, ...fillWarnings]) byCode.set(warning.code, warning);
  const notes = [...byCode.values()].map((warning) => {
    const known = titles[warning.code] ?? { title: 'Check the model', kind: 'check' as const };
    return { code: warning.code, title: known.title, message: warning.message, kind: known.kind };
  });
  return [...notes.filter((n) => n.kind === 'check'), ...notes.filter((n) => n.kind === 'fixed')];
}
