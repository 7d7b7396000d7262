import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { useOutbox } from '../../../lib/offline/outbox-context';
import type { OutboxEntry } from '../../../lib/offline/outbox-entry';
import { applyEdits, editableValues } from '../utils/entry-edits';

/** Changes a refused entry's values and sends it again (as a new request, with a new key). */
export function OutboxEntryEditor({ entry, onDone }: { entry: OutboxEntry; onDone: () => void }) {
  const outbox = useOutbox();
  const values = editableValues(entry);
  const [edits, setEdits] = useState<Record<string, string>>(() => Object.fromEntries(values.map((v) => [v.name, v.value])));
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const onSubmit = async (event: FormEvent) => {
    event.preventDefault();
    const changed = applyEdits(entry.request, entry.kind, edits);
    if (!changed.ok) {
      const label = values.find((v) => v.name === changed.problem.name)?.label ?? changed.problem.name;
      setProblem(`${label}: ${changed.problem.message}`);
      return;
    }
    setBusy(true);
    await outbox.replace(entry.id, changed.request);
    setBusy(false);
    onDone();
  };

  return (
    <form noValidate onSubmit={(e) => void onSubmit(e)} aria-label={`Change ${entry.label}`} className="flex flex-col gap-3">
      <FormAlert message={problem} title="Not sent yet" />
      {values.map((v) =>
        v.kind === 'checkbox' ? (
          <label key={v.name} className="flex min-h-12 items-center gap-3 font-semibold">
            <input
              type="checkbox"
              className="size-6 accent-walnut-800"
              checked={edits[v.name] === 'true'}
              onChange={(e) => setEdits({ ...edits, [v.name]: e.target.checked ? 'true' : '' })}
            />
            {v.label}
          </label>
        ) : (
          <Field key={v.name} label={v.label}>
            {(control) => (
              <Input
                {...control}
                inputMode={v.kind === 'number' ? 'decimal' : 'text'}
                className="min-h-12!"
                value={edits[v.name] ?? ''}
                onChange={(e) => setEdits({ ...edits, [v.name]: e.target.value })}
              />
            )}
          </Field>
        ),
      )}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" className="min-h-12!" busy={busy} busyLabel="Sending…">
          Send it changed
        </Button>
        <Button variant="secondary" className="min-h-12!" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
