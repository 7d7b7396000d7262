import type { CavityFill, CavityReport, LayerVolumes, MoldFill, MoldList, MoldStatus, MoldSummary, MoldUnits, MoldView, UpAxis, UpdateMoldRequest } from '@gelpoint/contracts';
import type { z } from 'zod';

export type { CavityFill, CavityReport, MoldFill, MoldView, UpdateMoldRequest };
export type MoldSummary = z.infer<typeof MoldSummary>;
export type MoldList = z.infer<typeof MoldList>;
export type MoldStatus = z.infer<typeof MoldStatus>;
export type MoldUnits = z.infer<typeof MoldUnits>;
export type UpAxis = z.infer<typeof UpAxis>;
export type LayerVolumes = z.infer<typeof LayerVolumes>;
export type DepthMap = NonNullable<CavityFill['depthMap']>;
export type Dam = CavityFill['dam'];
export type MoldWarning = CavityFill['warnings'][number];
