import type { FormEventHandler, ReactNode } from 'react';
import { Button } from '../../../components/ui/Button';
import { FormAlert } from '../../../components/ui/FormAlert';

export interface ProductFormProps {
  /** The form's accessible name. */
  label: string;
  /** The title of the alert when a save fails. */
  errorTitle: string;
  formError: string | null;
  onSubmit: FormEventHandler<HTMLFormElement>;
  submitLabel: string;
  busyLabel: string;
  busy: boolean;
  /** The form's sections. */
  children: ReactNode;
}

/** The frame every product form on the shelf shares: the alert for a failed save on top, the save button below. */
export function ProductForm({ label, errorTitle, formError, onSubmit, submitLabel, busyLabel, busy, children }: ProductFormProps) {
  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-6" aria-label={label}>
      <FormAlert message={formError} title={errorTitle} />
      {children}
      <div>
        <Button type="submit" busy={busy} busyLabel={busyLabel}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
