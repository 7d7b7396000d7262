import type { LotSort, LotView } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';
import { Link } from 'react-router';
import { Table, Td, Thead, Tr } from '../../../components/ui/Table';
import { paths } from '../../../config/paths';
import { formatCalendarDate } from '../utils/calendar-date';
import { lotStateOf, lotStateWords } from '../utils/lot-status';
import type { SortState } from '../utils/table-sort';
import { lotPartWords } from '../utils/shelf-words';
import { LotStateMark } from './LotStateMark';
import { SortableTh } from './SortableTh';

export interface LotsTableProps {
  lots: readonly LotView[];
  unitSystem: UnitSystem;
  sort: SortState | undefined;
  onSort: (key: LotSort) => void;
}

export function LotsTable({ lots, unitSystem, sort, onSort }: LotsTableProps) {
  const header = { sort, onSort };
  return (
    <Table caption="Lots on the shelf">
      <Thead>
        <tr>
          <SortableTh sortKey="lotNumber" {...header}>
            Lot
          </SortableTh>
          <SortableTh sortKey="product" {...header}>
            Product
          </SortableTh>
          <SortableTh sortKey="part" {...header}>
            Part
          </SortableTh>
          <SortableTh sortKey="remaining" {...header}>
            Left
          </SortableTh>
          <SortableTh sortKey="received" {...header}>
            Received
          </SortableTh>
          <SortableTh sortKey="expires" {...header}>
            Expires
          </SortableTh>
          <SortableTh sortKey="state" {...header}>
            Stock
          </SortableTh>
        </tr>
      </Thead>
      <tbody>
        {lots.map((lot) => {
          const state = lotStateOf(lot);
          return (
            <Tr key={lot.id}>
              <Td>
                <Link
                  to={paths.lot.getHref(lot.id)}
                  className="inline-flex min-h-touch items-center font-semibold whitespace-nowrap text-walnut-800 underline decoration-resin-400 decoration-2 underline-offset-4"
                >
                  {lot.lotNumber}
                </Link>
              </Td>
              <Td>{lot.productName}</Td>
              <Td>{lotPartWords[lot.part]}</Td>
              <Td>
                {formatMass(lot.remainingG, unitSystem).text}
                <span className="block text-sm text-ink-soft">of {formatMass(lot.quantityG, unitSystem).text}</span>
              </Td>
              <Td>
                <time dateTime={lot.receivedOn}>{formatCalendarDate(lot.receivedOn)}</time>
              </Td>
              <Td>{lot.expiresOn ? <time dateTime={lot.expiresOn}>{formatCalendarDate(lot.expiresOn)}</time> : 'No expiry given'}</Td>
              <Td>
                <LotStateMark state={state} />
                <span className="sr-only">: {lotStateWords[state].meaning}</span>
              </Td>
            </Tr>
          );
        })}
      </tbody>
    </Table>
  );
}
