import { auditSentence, type AuditEvent } from '@gelpoint/contracts';
import { Link } from 'react-router';
import { DateTime } from '../../../components/ui/DateTime';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';

/** Who did it, in words; events with no person behind them came from the shop thermometer or from Gelpoint itself. */
function actorWords(event: AuditEvent): string {
  if (event.actor) return event.actor.name || 'a former member';
  return event.detail.source === 'sensor' ? 'the shop thermometer' : 'Gelpoint';
}

/** One event as a sentence, "Lot BRI-A-0412 deleted by Ana Ruiz", with the object linked while it exists. */
export function AuditSentence({ event }: { event: AuditEvent }) {
  const s = auditSentence(event);
  return (
    <span>
      {s.before}
      {s.name !== null ? (
        <>
          {' '}
          {event.link ? (
            <Link
              to={event.link}
              className="font-semibold text-walnut-700 underline decoration-resin-400 decoration-2 underline-offset-4 hover:text-walnut-900"
            >
              {s.name}
            </Link>
          ) : (
            <strong className="font-semibold">{s.name}</strong>
          )}
        </>
      ) : null}
      {s.after ? ` ${s.after}` : ''} by <strong className="font-semibold">{actorWords(event)}</strong>
    </span>
  );
}

export function AuditTable({ events }: { events: readonly AuditEvent[] }) {
  return (
    <Table caption="Events in this shop, newest first">
      <Thead>
        <tr>
          <Th>When</Th>
          <Th>What happened</Th>
        </tr>
      </Thead>
      <tbody>
        {events.map((event) => (
          <Tr key={event.id}>
            <Td className="whitespace-nowrap align-top">
              <DateTime iso={event.at} />
            </Td>
            <Td>
              <AuditSentence event={event} />
            </Td>
          </Tr>
        ))}
      </tbody>
    </Table>
  );
}
