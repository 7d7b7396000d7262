import type { Shop as ShopRow } from '@gelpoint/db';
import type { Shop } from '@gelpoint/contracts';

export const shopView = (s: ShopRow): Shop => ({
  id: s.id,
  name: s.name,
  unitSystem: s.unitSystem,
  scaleResolutionG: s.scaleResolutionG,
  offRatioTolerancePct: s.offRatioTolerancePct,
  readingCarryH: s.readingCarryH,
  windowCloseLeadMin: s.windowCloseLeadMin,
  timeZone: s.timeZone,
  temperatureProfile: s.temperatureProfile,
  dayStartHour: s.dayStartHour,
  quietFromHour: s.quietFromHour,
  currency: s.currency,
});
