import { auditKinds } from '@gelpoint/contracts';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { paths } from '../../../config/paths';
import { useMembers } from '../api/get-members';
import type { AuditFilters } from '../utils/audit-cursor';

const kindOptions = auditKinds.map((k) => ({ value: k.kind, label: k.label }));

/** The audit's filters live in the address, so a filtered view can be bookmarked, shared, reloaded and exported. */
export function AuditFilterForm({ filters }: { filters: AuditFilters }) {
  const navigate = useNavigate();
  const members = useMembers();
  const [who, setWho] = useState(filters.who ?? '');
  const [kind, setKind] = useState(filters.kind ?? '');
  const [from, setFrom] = useState(filters.from ?? '');
  const [to, setTo] = useState(filters.to ?? '');
  const [rangeError, setRangeError] = useState<string | undefined>(undefined);
  const filtered = Boolean(filters.who || filters.kind || filters.from || filters.to);
  // Whoever the address names stays choosable even before the list of members arrives.
  const people = (members.data ?? []).map((m) => ({ value: m.userId, label: m.status === 'active' ? m.name : `${m.name} (disabled)` }));
  if (filters.who && !people.some((p) => p.value === filters.who)) people.push({ value: filters.who, label: 'The member in the address' });

  return (
    <form
      role="search"
      aria-label="Filter the audit"
      noValidate
      className="mb-6 grid gap-4 rounded-xl border border-line bg-white p-4 sm:grid-cols-2 lg:grid-cols-[repeat(4,minmax(0,1fr))_auto] lg:items-end"
      onSubmit={(event) => {
        event.preventDefault();
        if (from && to && to < from) {
          setRangeError('The last day must be on or after the first day.');
          return;
        }
        setRangeError(undefined);
        void navigate(paths.audit.getHref({ who: who || undefined, kind: kind || undefined, from: from || undefined, to: to || undefined }));
      }}
    >
      <Field label="Person">
        {(control) => <Select {...control} value={who} onChange={(event) => setWho(event.target.value)} options={people} emptyOption="Everyone" />}
      </Field>
      <Field label="Kind of event">
        {(control) => <Select {...control} value={kind} onChange={(event) => setKind(event.target.value)} options={kindOptions} emptyOption="Every kind" />}
      </Field>
      <Field label="From (day)">{(control) => <Input {...control} type="date" value={from} onChange={(event) => setFrom(event.target.value)} />}</Field>
      <Field label="To (day)" error={rangeError}>
        {(control) => <Input {...control} type="date" value={to} min={from || undefined} onChange={(event) => setTo(event.target.value)} />}
      </Field>
      <div className="flex gap-2">
        <Button type="submit">Show</Button>
        {filtered ? (
          <Button
            variant="quiet"
            onClick={() => {
              setWho('');
              setKind('');
              setFrom('');
              setTo('');
              setRangeError(undefined);
              void navigate(paths.audit.getHref());
            }}
          >
            Clear
          </Button>
        ) : null}
      </div>
    </form>
  );
}
