import { readDecimal } from '@gelpoint/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { applyServerErrors } from '../../../lib/form-errors';
import { useMarkMachined } from '../api/mark-machined';

const MachinedFields = z.object({
  finishCoats: z.string().transform((text, ctx) => {
    const value = readDecimal(text);
    if (value === null || !Number.isInteger(value) || value < 0 || value > 20) {
      ctx.addIssue({ code: 'custom', message: 'Enter how many finish coats go on, a whole number from 0 to 20.' });
      return z.NEVER;
    }
    return value;
  }),
  hoursBetweenCoats: z.string().transform((text, ctx) => {
    const value = readDecimal(text);
    if (value === null || value <= 0 || value > 720) {
      ctx.addIssue({ code: 'custom', message: "Enter the hours between coats from the finish's data sheet, above 0 and at most 720." });
      return z.NEVER;
    }
    return value;
  }),
});
type MachinedInput = z.input<typeof MachinedFields>;
type MachinedValues = z.output<typeof MachinedFields>;
const fieldNames = ['finishCoats', 'hoursBetweenCoats'] as const;

/** Machining is done: the finish coats and their spacing set the reminders that follow. */
export function MachinedForm({ pourId }: { pourId: string }) {
  const form = useForm<MachinedInput, unknown, MachinedValues>({
    resolver: zodResolver(MachinedFields),
    defaultValues: { finishCoats: '2', hoursBetweenCoats: '24' },
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const machined = useMarkMachined(pourId);

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await machined.mutateAsync(values);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Mark as machined" className="flex flex-col gap-4">
      <FormAlert message={formError} title="Not marked as machined" />
      {machined.isSuccess ? <Alert tone="success">Marked as machined; finish-coat reminders are set.</Alert> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Finish coats" error={errors.finishCoats?.message} required>
          {(control) => <Input {...control} inputMode="numeric" className="min-h-12!" {...form.register('finishCoats')} />}
        </Field>
        <Field label="Hours between coats" error={errors.hoursBetweenCoats?.message} required>
          {(control) => <Input {...control} inputMode="decimal" className="min-h-12!" {...form.register('hoursBetweenCoats')} />}
        </Field>
      </div>
      <div>
        <Button type="submit" className="min-h-12!" busy={machined.isPending} busyLabel="Saving…">
          Machining is done
        </Button>
      </div>
    </form>
  );
}
