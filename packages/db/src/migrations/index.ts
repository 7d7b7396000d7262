// Every migration, oldest first. `npm run db:generate -- Name` appends here; landed migrations are never edited.
import { MouldDepthMapApart1796375915921 } from './1796375915921-mouldDepthMapApart';
import { ExothermSettings1796375729058 } from './1796375729058-exothermSettings';
import { IdempotencyKeys1796371067731 } from './1796371067731-idempotencyKeys';
import { MorningDigest1796370824938 } from './1796370824938-morningDigest';
import { ShopClock1796369837636 } from './1796369837636-shopClock';
import { PlansKeepTheirMould1796368426009 } from './1796368426009-plansKeepTheirMould';
import { ShopCurrency1796364505780 } from './1796364505780-shopCurrency';
import { AddMouldFormat1796364415007 } from './1796364415007-addMouldFormat';
import { LogCorrections1796364339383 } from './1796364339383-logCorrections';
import { CureEvidence1796362314835 } from './1796362314835-cureEvidence';
import { RateLimitCounters1796175582050 } from './1796175582050-rateLimitCounters';
import { PoursCureLogReminders1796169088290 } from './1796169088290-poursCureLogReminders';
import { MoldsShelfPourPlans1796168546354 } from './1796168546354-moldsShelfPourPlans';
import { Foundation1796166861733 } from './1796166861733-foundation';
export const migrations: Function[] = [
  Foundation1796166861733,
  MoldsShelfPourPlans1796168546354,
  PoursCureLogReminders1796169088290,
  RateLimitCounters1796175582050,
  CureEvidence1796362314835,
  LogCorrections1796364339383,
  AddMouldFormat1796364415007,
  ShopCurrency1796364505780,
  PlansKeepTheirMould1796368426009,
  ShopClock1796369837636,
  MorningDigest1796370824938,
  IdempotencyKeys1796371067731,
  ExothermSettings1796375729058,
  MouldDepthMapApart1796375915921,
];
