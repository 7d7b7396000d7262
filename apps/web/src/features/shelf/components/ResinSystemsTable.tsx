import type { ResinSystemSort, ResinSystemView } from '@gelpoint/contracts';
import { formatLength, formatMass, type UnitSystem } from '@gelpoint/core';
import { Link } from 'react-router';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';
import { paths } from '../../../config/paths';
import type { SortState } from '../utils/table-sort';
import { mixRatioText, resinUseWords } from '../utils/shelf-words';
import { ArchivedMark } from './ArchivedMark';
import { SortableTh } from './SortableTh';
import { formatMoney } from '../../../lib/money';

export interface ResinSystemsTableProps {
  resinSystems: readonly ResinSystemView[];
  unitSystem: UnitSystem;
  /** The shop's ISO 4217 code: prices are in it. */
  currency: string;
  sort: SortState | undefined;
  onSort: (key: ResinSystemSort) => void;
}

export function ResinSystemsTable({ resinSystems, unitSystem, currency, sort, onSort }: ResinSystemsTableProps) {
  const header = { sort, onSort };
  return (
    <Table caption="Resin systems on the shelf">
      <Thead>
        <tr>
          <SortableTh sortKey="name" {...header}>
            Product
          </SortableTh>
          <SortableTh sortKey="use" {...header}>
            Use
          </SortableTh>
          <Th>Mix ratio</Th>
          <SortableTh sortKey="potLife" {...header}>
            Pot life
          </SortableTh>
          <SortableTh sortKey="maxLayer" {...header}>
            Maximum layer
          </SortableTh>
          <SortableTh sortKey="maxBatch" {...header}>
            Maximum batch
          </SortableTh>
          <SortableTh sortKey="pricePerKg" {...header}>
            Price per kit
          </SortableTh>
        </tr>
      </Thead>
      <tbody>
        {resinSystems.map((product) => (
          <Tr key={product.id}>
            <Td>
              <Link
                to={paths.resinSystem.getHref(product.id)}
                className="font-semibold text-walnut-800 underline decoration-resin-400 decoration-2 underline-offset-4"
              >
                {product.name}
              </Link>
              {product.archived ? <ArchivedMark /> : null}
              {product.maker ? <span className="block text-sm text-ink-soft">{product.maker}</span> : null}
            </Td>
            <Td>{resinUseWords[product.use]}</Td>
            <Td>{mixRatioText(product.mixRatio)}</Td>
            <Td>
              {product.potLifeMin}&nbsp;min at {product.referenceTempC}&nbsp;°C
            </Td>
            <Td>{formatLength(product.maxLayerMm, unitSystem).text}</Td>
            <Td>{formatMass(product.maxBatchG, unitSystem).text}</Td>
            <Td>
              {formatMoney(product.pricePerKit, currency)} for {formatMass(product.kitSizeG, unitSystem).text}
            </Td>
          </Tr>
        ))}
      </tbody>
    </Table>
  );
}
