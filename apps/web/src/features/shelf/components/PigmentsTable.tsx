import type { PigmentView } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';
import { Link } from 'react-router';
import { Table, Td, Thead, Tr } from '../../../components/ui/Table';
import { paths } from '../../../config/paths';
import { sortRows, type SortState, type SortValue } from '../utils/table-sort';
import { pigmentKindWords } from '../utils/shelf-words';
import { ArchivedMark } from './ArchivedMark';
import { SortableTh } from './SortableTh';

function sortValue(pigment: PigmentView, key: string): SortValue {
  switch (key) {
    case 'name':
      return pigment.name;
    case 'kind':
      return pigmentKindWords[pigment.kind];
    case 'recommendedPct':
      return pigment.recommendedPct;
    case 'maxPct':
      return pigment.maxPct;
    case 'pricePerG':
      return pigment.pricePerPack / pigment.packSizeG;
    default:
      return null;
  }
}

export interface PigmentsTableProps {
  pigments: readonly PigmentView[];
  unitSystem: UnitSystem;
  sort: SortState | undefined;
  onSort: (key: string) => void;
}

export function PigmentsTable({ pigments, unitSystem, sort, onSort }: PigmentsTableProps) {
  const rows = sortRows(pigments, sort, sortValue);
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
          <SortableTh sortKey="recommendedPct" {...header}>
            Recommended loading
          </SortableTh>
          <SortableTh sortKey="maxPct" {...header}>
            Maximum loading
          </SortableTh>
          <SortableTh sortKey="pricePerG" {...header}>
            Price per pack
          </SortableTh>
        </tr>
      </Thead>
      <tbody>
        {rows.map((pigment) => (
          <Tr key={pigment.id}>
            <Td>
              <Link to={paths.pigment.getHref(pigment.id)} className="font-semibold text-walnut-800 underline decoration-resin-400 decoration-2 underline-offset-4">
                {pigment.name}
              </Link>
              {pigment.archived ? <ArchivedMark /> : null}
            </Td>
            <Td>{pigmentKindWords[pigment.kind]}</Td>
            <Td>{pigment.recommendedPct} % of resin mass</Td>
            <Td>{pigment.maxPct} % of resin mass</Td>
            <Td>
              {pigment.pricePerPack.toFixed(2)} for {formatMass(pigment.packSizeG, unitSystem).text}
            </Td>
          </Tr>
        ))}
      </tbody>
    </Table>
  );
}
