import type { LotView } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';
import { formatCalendarDate } from '../utils/calendar-date';
import { lotStateOf, lotStateWords } from '../utils/lot-status';
import { lotPartWords } from '../utils/shelf-words';
import { DataSheet } from './DataSheet';
import { LotStateMark } from './LotStateMark';

export function LotSheet({ lot, unitSystem }: { lot: LotView; unitSystem: UnitSystem }) {
  const state = lotStateOf(lot);
  return (
    <DataSheet
      groups={[
        {
          title: 'Lot',
          rows: [
            { term: 'Product', value: lot.productName },
            { term: 'Part', value: lotPartWords[lot.part] },
            { term: 'Stock', value: <LotStateMark state={state} /> },
            { term: 'What that means', value: lotStateWords[state].meaning },
          ],
        },
        {
          title: 'Quantity and dates',
          rows: [
            { term: 'Received', value: `${formatMass(lot.quantityG, unitSystem).text} on ${formatCalendarDate(lot.receivedOn)}` },
            { term: 'Left', value: formatMass(lot.remainingG, unitSystem).text },
            { term: 'Expires', value: lot.expiresOn ? formatCalendarDate(lot.expiresOn) : 'No expiry given' },
            { term: 'Notes', value: lot.notes || 'None' },
          ],
        },
      ]}
    />
  );
}
