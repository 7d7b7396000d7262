import { useEffect, useState } from 'react';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { Card } from '../../../components/ui/Card';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Field } from '../../../components/ui/Field';
import { Input } from '../../../components/ui/Input';
import { QrCode } from '../../../components/ui/QrCode';
import { errorNotice } from '../../../lib/error-notice';
import { useRotateCalendarUrl } from '../api/rotate-calendar-url';
import { copyText, subscribeLinkOf } from '../utils/calendar-links';

/** Long enough to read, short enough that a second copy shows its own confirmation. */
const copiedShownMs = 4_000;

type CopyState = { kind: 'idle' } | { kind: 'copied' } | { kind: 'failed'; message: string };

/**
 * The member's private calendar feed: the shop's coming pour steps in the phone's own calendar. The link is the only
 * key to the feed, so it can be replaced when it has been shared by mistake.
 */
export function CalendarFeedPanel({ calendarUrl }: { calendarUrl: string }) {
  const rotate = useRotateCalendarUrl();
  const [copy, setCopy] = useState<CopyState>({ kind: 'idle' });
  const [asking, setAsking] = useState(false);
  const [replaced, setReplaced] = useState(false);
  const subscribeLink = subscribeLinkOf(calendarUrl);

  useEffect(() => {
    if (copy.kind !== 'copied') return;
    const timer = setTimeout(() => setCopy({ kind: 'idle' }), copiedShownMs);
    return () => clearTimeout(timer);
  }, [copy]);

  const copyLink = async () => {
    const outcome = await copyText(calendarUrl, typeof navigator === 'undefined' ? undefined : navigator.clipboard);
    setCopy(outcome.ok ? { kind: 'copied' } : { kind: 'failed', message: outcome.message });
  };

  const replaceLink = () =>
    rotate.mutate(undefined, {
      onSuccess: () => {
        setAsking(false);
        setReplaced(true);
        setCopy({ kind: 'idle' });
      },
    });

  return (
    <Card title="Calendar on your phone" aria-label="Calendar on your phone">
      <div className="flex flex-col gap-4 sm:flex-row sm:items-start sm:gap-6">
        <div className="flex min-w-0 flex-1 flex-col gap-4">
          <p>
            The reminders and forecast cure stages of the shop&apos;s open pours can sit in your own calendar and keep themselves up to date. Add the link below
            as a subscribed calendar: on this phone, press &quot;Subscribe on this device&quot;; from a computer, scan the code with the phone&apos;s camera; in
            a calendar app, paste the link where it asks for a calendar address (URL).
          </p>
          <Field label="Your calendar link" hint="Private: anyone with this link can see the shop's planned steps. Keep it to yourself.">
            {(control) => (
              <Input
                {...control}
                readOnly
                value={calendarUrl}
                spellCheck={false}
                className="font-mono text-sm"
                onFocus={(event) => event.currentTarget.select()}
              />
            )}
          </Field>
          <div className="flex flex-wrap items-center gap-2">
            <Button variant="secondary" onClick={() => void copyLink()}>
              Copy the link
            </Button>
            {subscribeLink ? (
              <a
                href={subscribeLink}
                className="inline-flex min-h-touch items-center px-2 font-semibold text-walnut-700 underline decoration-resin-400 decoration-2 underline-offset-4"
              >
                Subscribe on this device
              </a>
            ) : null}
            <span role="status" className="font-semibold text-moss-700">
              {copy.kind === 'copied' ? 'Copied' : ''}
            </span>
          </div>
          {copy.kind === 'failed' ? (
            <Alert tone="warning" title="Not copied">
              {copy.message}
            </Alert>
          ) : null}
          {replaced ? (
            <Alert tone="success" title="New link made">
              The old link no longer works. Calendars that used it need the new one.
            </Alert>
          ) : null}
          <div>
            <Button variant="quiet" onClick={() => setAsking(true)}>
              New link…
            </Button>
          </div>
        </div>
        <QrCode value={calendarUrl} label="QR code of your calendar link" sizePx={160} className="shrink-0 self-center sm:self-start" />
      </div>
      <ConfirmDialog
        open={asking}
        title="Make a new calendar link?"
        confirmLabel="Make a new link"
        tone="primary"
        busy={rotate.isPending}
        error={rotate.error ? <FormAlert title="No new link" message={errorNotice(rotate.error).message} /> : null}
        onConfirm={replaceLink}
        onCancel={() => {
          setAsking(false);
          rotate.reset();
        }}
      >
        The link you have now stops working at once: every calendar subscribed to it stops updating until you add the new one.
      </ConfirmDialog>
    </Card>
  );
}
