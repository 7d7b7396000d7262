import { formatVolume, mm3ToMl, type UnitSystem } from '@gelpoint/core';
import { Link } from 'react-router';
import { DateTime } from '../../../components/ui/DateTime';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';
import { paths } from '../../../config/paths';
import type { MoldSummary } from '../types';
import { MoldStatusBadge } from './MoldStatusBadge';

export interface MoldsTableProps {
  molds: readonly MoldSummary[];
  pieceNames: ReadonlyMap<string, string>;
  unitSystem: UnitSystem;
}

export function MoldsTable({ molds, pieceNames, unitSystem }: MoldsTableProps) {
  return (
    <Table caption="Moulds">
      <Thead>
        <tr>
          <Th>Name</Th>
          <Th>Piece</Th>
          <Th>Status</Th>
          <Th className="text-right">Volume to the top</Th>
          <Th>Uploaded</Th>
        </tr>
      </Thead>
      <tbody>
        {molds.map((mold) => (
          <Tr key={mold.id}>
            <Td>
              <Link to={paths.mould.getHref(mold.id)} className="font-semibold text-walnut-800 underline decoration-resin-400 decoration-2 underline-offset-4">
                {mold.name}
              </Link>
              <span className="block text-sm text-ink-soft">{mold.fileName}</span>
            </Td>
            <Td>{mold.pieceId ? (pieceNames.get(mold.pieceId) ?? 'A piece not listed') : <span className="text-ink-soft">None</span>}</Td>
            <Td>
              <MoldStatusBadge status={mold.status} />
            </Td>
            <Td className="text-right tabular-nums">
              {mold.fillVolumeToTopMm3 === null ? (
                <span className="text-ink-soft">Not measured yet</span>
              ) : (
                formatVolume(mm3ToMl(mold.fillVolumeToTopMm3), unitSystem).text
              )}
            </Td>
            <Td>
              <DateTime iso={mold.createdAt} />
            </Td>
          </Tr>
        ))}
      </tbody>
    </Table>
  );
}
