import { LotPart } from '@gelpoint/contracts';

export const lotParts = LotPart.options;
