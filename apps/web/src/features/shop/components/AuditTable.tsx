import type { AuditEvent } from '@gelpoint/contracts';
import { DateTime } from '../../../components/ui/DateTime';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';

export function AuditTable({ events }: { events: readonly AuditEvent[] }) {
  return (
    <Table caption="Recent events in this shop">
      <Thead>
        <tr>
          <Th>When</Th>
          <Th>Who</Th>
          <Th>What</Th>
          <Th>On</Th>
        </tr>
      </Thead>
      <tbody>
        {events.map((event) => (
          <Tr key={event.id}>
            <Td className="whitespace-nowrap">
              <DateTime iso={event.at} />
            </Td>
            <Td>{event.actor?.name ?? 'Gelpoint'}</Td>
            <Td>
              <code className="rounded bg-paper-deep px-1.5 py-0.5 font-mono text-sm">{event.action}</code>
            </Td>
            <Td className="text-ink-soft">
              {event.objectType}
              {event.objectId ? <span className="ml-1 font-mono text-sm">{event.objectId.slice(0, 8)}</span> : null}
            </Td>
          </Tr>
        ))}
      </tbody>
    </Table>
  );
}
