import type { ReminderView } from '@gelpoint/contracts';
import { cx } from '../../../lib/cx';
import { MarkDoneButton } from './MarkDoneButton';
import { RelativeTime } from './RelativeTime';

/** The pour's reminders, soonest first; cancelled ones are left out. */
export function PourReminders({ reminders }: { reminders: readonly ReminderView[] }) {
  const shown = reminders.filter((r) => r.status !== 'cancelled' || r.done !== null).sort((p, q) => Date.parse(p.dueAt) - Date.parse(q.dueAt));
  if (shown.length === 0) return <p className="text-ink-soft">No reminders yet; they are set once the first cup is logged.</p>;
  return (
    <ul className="flex flex-col gap-2" aria-label="Reminders of this pour">
      {shown.map((reminder) => (
        <li
          key={reminder.id}
          className={cx(
            'flex flex-wrap items-baseline gap-x-3 rounded-lg px-3 py-2',
            reminder.status === 'sent' ? 'bg-paper text-ink-soft' : reminder.done ? 'bg-moss-50' : 'bg-resin-50',
          )}
        >
          <span className="font-semibold text-ink">{reminder.title}</span>
          <span>
            {reminder.status === 'sent' ? (
              <>
                sent <RelativeTime iso={reminder.sentAt ?? reminder.dueAt} />
              </>
            ) : reminder.leadMin > 0 ? (
              <>
                closes <RelativeTime iso={reminder.eventAt} />; the reminder goes out {reminder.leadMin} min before
              </>
            ) : (
              <>
                due <RelativeTime iso={reminder.dueAt} />
              </>
            )}
          </span>
          {reminder.assumed ? <span className="text-sm text-ink-soft">(time rests on the assumed temperature)</span> : null}
          {reminder.done ? (
            <span className="text-sm font-semibold text-moss-700">
              Done{reminder.done.how === 'logged' ? ' (its step is logged)' : reminder.done.by ? ` (marked by ${reminder.done.by.name})` : ''}
            </span>
          ) : (
            <MarkDoneButton reminderId={reminder.id} title={reminder.title} />
          )}
        </li>
      ))}
    </ul>
  );
}
