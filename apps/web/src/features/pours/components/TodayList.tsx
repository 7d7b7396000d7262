import { EmptyState } from '../../../components/ui/EmptyState';
import { TextLink } from '../../../components/ui/TextLink';
import { paths } from '../../../config/paths';
import { cx } from '../../../lib/cx';
import { useNow } from '../hooks/use-now';
import type { Today } from '../types';
import { isOverdue } from '../utils/relative-time';
import { MarkDoneButton } from './MarkDoneButton';
import { RelativeTime } from './RelativeTime';

/** Reminders due in the next day or already overdue, oldest first, each leading to its pour. */
export function TodayList({ today }: { today: Today }) {
  const now = useNow(30_000);
  const due = [...today.due].sort((p, q) => Date.parse(p.dueAt) - Date.parse(q.dueAt));
  if (due.length === 0) {
    return (
      <EmptyState title="Nothing due in the next 24 hours">
        {today.openPours === 0
          ? 'No pour is curing right now.'
          : `${today.openPours === 1 ? '1 pour is' : `${today.openPours} pours are`} curing; the cure board shows how far.`}
      </EmptyState>
    );
  }
  return (
    <section aria-labelledby="today-due" className="flex flex-col gap-3">
      <h2 id="today-due" className="text-xl font-bold text-walnut-900">
        Due now and in the next 24 hours
      </h2>
      <ul className="flex flex-col gap-3">
        {due.map((reminder) => {
          const notice = reminder.kind === 'piece_released' || reminder.kind === 'piece_machined';
          const overdue = !notice && reminder.status === 'pending' && isOverdue(Date.parse(reminder.dueAt), now);
          return (
            <li key={reminder.id} className={cx('flex flex-col gap-1 rounded-xl border bg-white p-4', overdue ? 'border-l-4 border-ember-600' : 'border-line')}>
              <p className="text-lg font-bold text-walnut-900">
                {overdue ? <span className="mr-2 rounded bg-ember-50 px-1.5 py-0.5 text-sm text-ember-700">Overdue</span> : null}
                {reminder.title}
              </p>
              <p className="text-ink-soft">
                {reminder.pieceName} ·{' '}
                {notice ? (
                  <RelativeTime iso={reminder.eventAt} />
                ) : reminder.status === 'sent' ? (
                  <>
                    sent <RelativeTime iso={reminder.sentAt ?? reminder.dueAt} />
                    {reminder.leadMin > 0 ? (
                      <>
                        ; closes <RelativeTime iso={reminder.eventAt} />
                      </>
                    ) : null}
                  </>
                ) : reminder.leadMin > 0 ? (
                  <>
                    closes <RelativeTime iso={reminder.eventAt} />
                  </>
                ) : (
                  <>
                    {overdue ? 'was due' : 'due'} <RelativeTime iso={reminder.dueAt} />
                  </>
                )}
                {reminder.assumed ? ' (time rests on the assumed temperature)' : ''}
              </p>
              <div className="flex flex-wrap items-center gap-x-5 gap-y-2">
                <TextLink to={paths.pour.getHref(reminder.pourId)}>Open the pour of {reminder.pieceName}</TextLink>
                <MarkDoneButton reminderId={reminder.id} title={reminder.title} pourId={reminder.pourId} />
              </div>
            </li>
          );
        })}
      </ul>
      <p className="text-ink-soft">{today.openPours === 1 ? '1 pour is curing.' : `${today.openPours} pours are curing.`}</p>
    </section>
  );
}
