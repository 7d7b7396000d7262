import type { LotUse } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';
import { Link } from 'react-router';
import { DateTime } from '../../../components/ui/DateTime';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';
import { paths } from '../../../config/paths';
import { stepWords } from '../../../lib/step-words';

const linkClass = 'inline-flex min-h-touch items-center font-semibold text-walnut-800 underline decoration-resin-400 decoration-2 underline-offset-4';

/** The cups a lot went into, newest first, each with the piece and the pour it belongs to. */
export function LotUsesTable({ uses, unitSystem, lotNumber }: { uses: readonly LotUse[]; unitSystem: UnitSystem; lotNumber: string }) {
  return (
    <Table caption={`Batches mixed from lot ${lotNumber}`}>
      <Thead>
        <tr>
          <Th>Mixed</Th>
          <Th>Piece</Th>
          <Th>Pour</Th>
          <Th>Weighed</Th>
          <Th>Mixed by</Th>
        </tr>
      </Thead>
      <tbody>
        {uses.map((use) => (
          <Tr key={use.batchId} className={use.voided ? 'text-ink-soft' : undefined}>
            <Td className="whitespace-nowrap">
              <DateTime iso={use.mixedAt} />
            </Td>
            <Td>
              <Link to={paths.piece.getHref(use.piece.id)} className={linkClass}>
                {use.piece.name}
              </Link>
            </Td>
            <Td>
              <Link to={paths.pour.getHref(use.pourId)} className={linkClass}>
                {use.planName}
              </Link>
              <span className="block text-sm text-ink-soft">
                {stepWords(use.step)}, cup {use.planBatchIndex + 1}
                {use.voided ? ' · voided, not counted' : ''}
              </span>
            </Td>
            <Td className={use.voided ? 'tabular-nums line-through' : 'tabular-nums'}>{formatMass(use.weighedG, unitSystem).text}</Td>
            <Td>{use.mixedBy?.name ?? 'A former member'}</Td>
          </Tr>
        ))}
      </tbody>
    </Table>
  );
}
