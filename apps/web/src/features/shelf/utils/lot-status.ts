import type { LotView } from '@gelpoint/contracts';

export type LotState = 'expired' | 'used_up' | 'low' | 'in_stock';
export type LotShape = 'cross' | 'empty' | 'half' | 'full';

export interface LotStateWords {
  label: string;
  meaning: string;
  shape: LotShape;
}

export const lotStateWords: Record<LotState, LotStateWords> = {
  expired: { label: 'Expired', meaning: 'past its expiry date: do not mix from it', shape: 'cross' },
  used_up: { label: 'Used up', meaning: 'nothing left to weigh out', shape: 'empty' },
  low: { label: 'Running low', meaning: 'less than a tenth of what came in is left', shape: 'half' },
  in_stock: { label: 'In stock', meaning: 'in date, with stock left', shape: 'full' },
};

/** An expired lot is unusable however much is left, so expiry speaks first; then what is left on the shelf. */
export function lotStateOf(lot: Pick<LotView, 'expired' | 'low' | 'remainingG'>): LotState {
  if (lot.expired) return 'expired';
  if (lot.remainingG <= 0) return 'used_up';
  if (lot.low) return 'low';
  return 'in_stock';
}
