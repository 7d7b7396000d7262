import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { useMarkReminderDone } from '../api/mark-reminder-done';

/** Any member may say a reminder is dealt with; who and when are kept, and it leaves Today. */
export function MarkDoneButton({ reminderId, title, pourId = null }: { reminderId: string; title: string; pourId?: string | null }) {
  const done = useMarkReminderDone();
  if (done.data?.queued) {
    return <Alert tone="info">Marked done on this phone; it is sent when the connection returns.</Alert>;
  }
  return (
    <div className="flex flex-col gap-2">
      <div>
        <Button
          variant="secondary"
          className="min-h-11!"
          busy={done.isPending}
          busyLabel="Marking…"
          aria-label={`Mark done: ${title}`}
          onClick={() => done.mutate({ reminderId, title, pourId })}
        >
          Mark done
        </Button>
      </div>
      {done.isError ? <ErrorAlert error={done.error} /> : null}
    </div>
  );
}
