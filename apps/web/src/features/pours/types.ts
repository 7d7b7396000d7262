import type { CureCheckStage, CureCheckView, CureView, PourList, PourStatus, ReadingsAdded, TodayView } from '@gelpoint/contracts';
import type { z } from 'zod';

// The contracts export schemas for these; the pages work with their parsed shapes.
export type Cure = z.infer<typeof CureView>;
export type CureCheck = z.infer<typeof CureCheckView>;
export type CureCheckStageKey = z.infer<typeof CureCheckStage>;
export type PourPage = z.infer<typeof PourList>;
export type PourStatusKey = z.infer<typeof PourStatus>;
export type Today = z.infer<typeof TodayView>;
export type ReadingsAddedAnswer = z.infer<typeof ReadingsAdded>;
export type StageTimingEntry = Cure['stages'][number];
