import type {
  CavityFill,
  CavityReport,
  LayerVolumes,
  MoldFileUnits,
  MoldFill,
  MoldFormat,
  MoldList,
  MoldStatus,
  MoldSummary,
  MoldUnits,
  MoldView,
  UpAxis,
  UpdateMoldRequest,
} from '@gelpoint/contracts';
import type { z } from 'zod';

export type { CavityFill, CavityReport, MoldFill, MoldView, UpdateMoldRequest };
export type MoldSummary = z.infer<typeof MoldSummary>;
export type MoldList = z.infer<typeof MoldList>;
export type MoldStatus = z.infer<typeof MoldStatus>;
/** The units a maker chooses for a file that carries none. */
export type MoldUnits = z.infer<typeof MoldUnits>;
/** The units a stored mould was read in (a 3MF may state others). */
export type MoldFileUnits = z.infer<typeof MoldFileUnits>;
export type MoldFormat = z.infer<typeof MoldFormat>;
export type UpAxis = z.infer<typeof UpAxis>;
export type LayerVolumes = z.infer<typeof LayerVolumes>;
export type DepthMap = NonNullable<CavityFill['depthMap']>;
export type Dam = CavityFill['dam'];
export type MoldWarning = CavityFill['warnings'][number];
