import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { formatDateTime } from '../../../lib/format';
import { useOutbox, useOutboxEntries } from '../../../lib/offline/outbox-context';
import type { OutboxEntry } from '../../../lib/offline/outbox-entry';
import { OutboxEntryEditor } from './OutboxEntryEditor';

const waitWords = (n: number) => (n === 1 ? '1 entry waits to be sent' : `${n} entries wait to be sent`);

function RefusedEntry({ entry }: { entry: OutboxEntry }) {
  const outbox = useOutbox();
  const [mode, setMode] = useState<'view' | 'edit' | 'discard'>('view');
  const [busy, setBusy] = useState(false);
  const act = async (action: () => Promise<void>) => {
    setBusy(true);
    await action();
    setBusy(false);
  };
  return (
    <li className="flex flex-col gap-3 rounded-lg border border-ember-600 bg-white p-3">
      <p>
        <strong>{entry.label}</strong>, logged {formatDateTime(entry.createdAt)}: <strong>the server did not take it.</strong>
      </p>
      <p className="text-ember-700">{entry.refusal?.message}</p>
      {mode === 'edit' ? (
        <OutboxEntryEditor entry={entry} onDone={() => setMode('view')} />
      ) : mode === 'discard' ? (
        <div className="flex flex-col gap-2">
          <p className="font-semibold">Discard it? It was never saved on the server, and it cannot be brought back.</p>
          <div className="flex flex-wrap gap-3">
            <Button variant="danger" className="min-h-12!" busy={busy} busyLabel="Discarding…" onClick={() => void act(() => outbox.discard(entry.id))}>
              Discard it
            </Button>
            <Button variant="secondary" className="min-h-12!" onClick={() => setMode('view')}>
              Keep it
            </Button>
          </div>
        </div>
      ) : (
        <div className="flex flex-wrap gap-3">
          <Button className="min-h-12!" busy={busy} busyLabel="Sending…" onClick={() => void act(() => outbox.retry(entry.id))}>
            Send again
          </Button>
          {entry.kind !== 'reminder-done' ? (
            <Button variant="secondary" className="min-h-12!" onClick={() => setMode('edit')}>
              Change it
            </Button>
          ) : null}
          <Button variant="secondary" className="min-h-12!" onClick={() => setMode('discard')}>
            Discard…
          </Button>
        </div>
      )}
    </li>
  );
}

/**
 * What this phone logged that the server has not taken yet: how many wait, and each refused one in plain words with
 * what can be done about it. Nothing leaves this list without being sent or discarded by the person.
 */
export function OutboxPanel() {
  const entries = useOutboxEntries();
  if (entries.length === 0) return null;
  const waiting = entries.filter((e) => e.state === 'waiting');
  const refused = entries.filter((e) => e.state === 'refused');
  const problem = waiting.find((e) => e.lastProblem)?.lastProblem;
  return (
    <section aria-label="Not sent yet" className="mb-4 flex flex-col gap-3 rounded-lg border border-resin-500 bg-resin-50 px-4 py-3 text-walnut-900">
      {waiting.length > 0 ? (
        <div role="status">
          <p className="font-bold">{waitWords(waiting.length)}</p>
          <p className="text-sm">
            Kept on this phone; they go to the server in the order they were logged as soon as it can be reached.
            {problem ? ` Last try: ${problem}` : ''}
          </p>
          <ul className="mt-1 list-disc pl-5 text-sm">
            {waiting.map((e) => (
              <li key={e.id}>{e.label}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {refused.length > 0 ? (
        <div className="flex flex-col gap-2">
          <p className="font-bold">{refused.length === 1 ? '1 entry needs you' : `${refused.length} entries need you`}</p>
          <ul className="flex flex-col gap-2">
            {refused.map((e) => (
              <RefusedEntry key={e.id} entry={e} />
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}
