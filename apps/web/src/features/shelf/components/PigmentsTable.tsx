import type { PigmentSort, PigmentView } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';
import { Link } from 'react-router';
import { Table, Td, Thead, Tr } from '../../../components/ui/Table';
import { paths } from '../../../config/paths';
import type { SortState } from '../utils/table-sort';
import { pigmentKindWords } from '../utils/shelf-words';
import { ArchivedMark } from './ArchivedMark';
import { SortableTh } from './SortableTh';
import { formatMoney } from '../../../lib/money';

export interface PigmentsTableProps {
  pigments: readonly PigmentView[];
  unitSystem: UnitSystem;
  /** The shop's ISO 4217 code: prices are in it. */
  currency: string;
  sort: SortState | undefined;
  onSort: (key: PigmentSort) => void;
}

export function PigmentsTable({ pigments, unitSystem, currency, sort, onSort }: PigmentsTableProps) {
  const header = { sort, onSort };
  return (
    <Table caption="Pigments on the shelf">
      <Thead>
        <tr>
          <SortableTh sortKey="name" {...header}>
            Pigment
          </SortableTh>
          <SortableTh sortKey="kind" {...header}>
            Kind
          </SortableTh>
          <SortableTh sortKey="recommendedLoading" {...header}>
            Recommended loading
          </SortableTh>
          <SortableTh sortKey="maxLoading" {...header}>
            Maximum loading
          </SortableTh>
          <SortableTh sortKey="pricePerKg" {...header}>
            Price per pack
          </SortableTh>
        </tr>
      </Thead>
      <tbody>
        {pigments.map((pigment) => (
          <Tr key={pigment.id}>
            <Td>
              <Link
                to={paths.pigment.getHref(pigment.id)}
                className="font-semibold text-walnut-800 underline decoration-resin-400 decoration-2 underline-offset-4"
              >
                {pigment.name}
              </Link>
              {pigment.archived ? <ArchivedMark /> : null}
            </Td>
            <Td>{pigmentKindWords[pigment.kind]}</Td>
            <Td>{pigment.recommendedPct} % of part A + part B by mass</Td>
            <Td>{pigment.maxPct} % of part A + part B by mass</Td>
            <Td>
              {formatMoney(pigment.pricePerPack, currency)} for {formatMass(pigment.packSizeG, unitSystem).text}
            </Td>
          </Tr>
        ))}
      </tbody>
    </Table>
  );
}
