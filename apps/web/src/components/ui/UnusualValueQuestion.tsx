import { Alert } from './Alert';
import { Button } from './Button';

export interface UnusualValueQuestionProps {
  /** The log's question, in its own words (the API's sentence or the live check's). */
  message: string;
  /** What logging it anyway does, e.g. "Log 70 °C anyway". */
  confirmLabel: string;
  busy?: boolean;
  onConfirm: () => void;
  /** A suggested correction, e.g. the °F value read as °C. */
  suggestion?: { label: string; apply: () => void } | undefined;
}

/**
 * The log asks before it keeps an unusual value: the person either corrects it or logs it as it is, and the choice
 * is recorded with the entry.
 */
export function UnusualValueQuestion({ message, confirmLabel, busy = false, onConfirm, suggestion }: UnusualValueQuestionProps) {
  return (
    <Alert
      tone="warning"
      title="Is this right?"
      live="alert"
      actions={
        <div className="flex flex-wrap gap-2">
          {suggestion ? (
            <Button variant="primary" className="min-h-12!" onClick={suggestion.apply}>
              {suggestion.label}
            </Button>
          ) : null}
          <Button variant="secondary" className="min-h-12!" busy={busy} busyLabel="Saving…" onClick={onConfirm}>
            {confirmLabel}
          </Button>
        </div>
      }
    >
      {message}
    </Alert>
  );
}
