import type { PourPlanList } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';
import { Link } from 'react-router';
import type { z } from 'zod';
import { DateTime } from '../../../components/ui/DateTime';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';
import { paths } from '../../../config/paths';

type PlanRow = z.infer<typeof PourPlanList>['items'][number];

export interface PourPlansTableProps {
  plans: readonly PlanRow[];
  pieceNames: ReadonlyMap<string, string>;
  unitSystem: UnitSystem;
}

export function PourPlansTable({ plans, pieceNames, unitSystem }: PourPlansTableProps) {
  return (
    <Table caption="Pour plans of the shop, last changed first">
      <Thead>
        <tr>
          <Th>Plan</Th>
          <Th>Piece</Th>
          <Th>Resin to weigh out</Th>
          <Th>Updated</Th>
        </tr>
      </Thead>
      <tbody>
        {plans.map((plan) => (
          <Tr key={plan.id}>
            <Td>
              <Link
                to={paths.pourPlan.getHref(plan.id)}
                className="font-semibold text-walnut-800 underline decoration-resin-400 decoration-2 underline-offset-4"
              >
                {plan.name}
              </Link>
              {plan.createdBy ? <span className="block text-sm text-ink-soft">by {plan.createdBy.name}</span> : null}
            </Td>
            <Td>
              <Link to={paths.piece.getHref(plan.pieceId)} className="underline decoration-walnut-300 underline-offset-4">
                {pieceNames.get(plan.pieceId) ?? 'Open the piece'}
              </Link>
            </Td>
            <Td>{formatMass(plan.totalGrams, unitSystem).text}</Td>
            <Td>
              <DateTime iso={plan.updatedAt} />
            </Td>
          </Tr>
        ))}
      </tbody>
    </Table>
  );
}
