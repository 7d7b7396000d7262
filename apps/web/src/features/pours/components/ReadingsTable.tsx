import { mayVoidEntry, type ReadingView, type Role } from '@gelpoint/contracts';
import { formatTemperature, type UnitSystem } from '@gelpoint/core';
import { DateTime } from '../../../components/ui/DateTime';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';
import { VoidEntryButton } from './VoidEntryButton';

const sourceWords = { manual: 'typed in', csv: 'from a file', sensor: 'shop thermometer' } as const;

export interface ReadingsTableProps {
  pourId: string;
  readings: readonly ReadingView[];
  voided: readonly ReadingView[];
  unitSystem: UnitSystem;
  viewer: { userId: string; role: Role };
}

/** Every reading with who logged it and how; voided ones below, struck through, with their reason. */
export function ReadingsTable({ pourId, readings, voided, unitSystem, viewer }: ReadingsTableProps) {
  const temp = (tempC: number) => formatTemperature(tempC, unitSystem).text;
  if (readings.length === 0 && voided.length === 0) return null;
  return (
    <details className="rounded-lg border border-line bg-white p-3">
      <summary className="min-h-touch cursor-pointer font-semibold">
        All readings ({readings.length}
        {voided.length > 0 ? `, ${voided.length} voided` : ''})
      </summary>
      <Table caption="Temperature readings of this pour">
        <Thead>
          <Tr>
            <Th>Time</Th>
            <Th>Temperature</Th>
            <Th>Logged</Th>
            <Th>
              <span className="sr-only">Correct</span>
            </Th>
          </Tr>
        </Thead>
        <tbody>
          {readings.map((r) => (
            <Tr key={r.id}>
              <Td>
                <DateTime iso={r.at} />
              </Td>
              <Td className="tabular-nums">{temp(r.tempC)}</Td>
              <Td>
                {sourceWords[r.source]}
                {r.loggedBy ? ` by ${r.loggedBy.name}` : ''}
              </Td>
              <Td>
                {mayVoidEntry(viewer, r.loggedBy?.id ?? null) ? (
                  <VoidEntryButton pourId={pourId} kind="reading" id={r.id} what={`the reading of ${temp(r.tempC)}`} />
                ) : null}
              </Td>
            </Tr>
          ))}
          {voided.map((r) => (
            <Tr key={r.id}>
              <Td>
                <s>
                  <DateTime iso={r.at} />
                </s>
              </Td>
              <Td className="tabular-nums">
                <s>{temp(r.tempC)}</s>
              </Td>
              <Td colSpan={2}>
                Voided{r.voided?.by ? ` by ${r.voided.by.name}` : ''}: {r.voided?.reason}
              </Td>
            </Tr>
          ))}
        </tbody>
      </Table>
    </details>
  );
}
