import type { LotView } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';
import { Link } from 'react-router';
import { Table, Td, Thead, Tr } from '../../../components/ui/Table';
import { paths } from '../../../config/paths';
import { formatCalendarDate } from '../utils/calendar-date';
import { lotStateOf, lotStateWords } from '../utils/lot-status';
import { sortRows, type SortState, type SortValue } from '../utils/table-sort';
import { lotPartWords } from '../utils/shelf-words';
import { LotStateMark } from './LotStateMark';
import { SortableTh } from './SortableTh';

const stateOrder = { expired: 0, used_up: 1, low: 2, in_stock: 3 } as const;

function sortValue(lot: LotView, key: string): SortValue {
  switch (key) {
    case 'lotNumber':
      return lot.lotNumber;
    case 'productName':
      return lot.productName;
    case 'part':
      return lotPartWords[lot.part];
    case 'remainingG':
      return lot.remainingG;
    case 'receivedOn':
      return lot.receivedOn;
    case 'expiresOn':
      return lot.expiresOn;
    case 'state':
      return stateOrder[lotStateOf(lot)];
    default:
      return null;
  }
}

export interface LotsTableProps {
  lots: readonly LotView[];
  unitSystem: UnitSystem;
  sort: SortState | undefined;
  onSort: (key: string) => void;
}

export function LotsTable({ lots, unitSystem, sort, onSort }: LotsTableProps) {
  const rows = sortRows(lots, sort, sortValue);
  const header = { sort, onSort };
  return (
    <Table caption="Lots on the shelf">
      <Thead>
        <tr>
          <SortableTh sortKey="lotNumber" {...header}>
            Lot
          </SortableTh>
          <SortableTh sortKey="productName" {...header}>
            Product
          </SortableTh>
          <SortableTh sortKey="part" {...header}>
            Part
          </SortableTh>
          <SortableTh sortKey="remainingG" {...header}>
            Left
          </SortableTh>
          <SortableTh sortKey="receivedOn" {...header}>
            Received
          </SortableTh>
          <SortableTh sortKey="expiresOn" {...header}>
            Expires
          </SortableTh>
          <SortableTh sortKey="state" {...header}>
            Stock
          </SortableTh>
        </tr>
      </Thead>
      <tbody>
        {rows.map((lot) => {
          const state = lotStateOf(lot);
          return (
            <Tr key={lot.id}>
              <Td>
                <Link to={paths.lot.getHref(lot.id)} className="inline-flex min-h-touch items-center font-semibold whitespace-nowrap text-walnut-800 underline decoration-resin-400 decoration-2 underline-offset-4">
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
