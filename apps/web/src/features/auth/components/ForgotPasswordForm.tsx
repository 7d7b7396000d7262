import { PasswordResetRequest } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';

type ForgotInput = z.input<typeof PasswordResetRequest>;
type ForgotValues = z.output<typeof PasswordResetRequest>;
const fieldNames = ['email'] as const;

export function ForgotPasswordForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const [sentMessage, setSentMessage] = useState<string | null>(null);
  const form = useForm<ForgotInput, unknown, ForgotValues>({
    resolver: zodResolver(PasswordResetRequest),
    defaultValues: { email: '' },
  });
  const request = useRequestPasswordReset();
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSentMessage(null);
    try {
      const answer = await request.mutateAsync(values);
      setSentMessage(answer.message);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label="Request a password reset">
      <FormAlert message={formError} title="Could not send the link" />
      {sentMessage ? (
        <Alert tone="success" title="Check your e-mail">
          {sentMessage}
        </Alert>
      ) : null}
      <Field label="Email" hint="The address you sign in with." error={errors.email?.message} required>
        {(control) => <Input {...control} type="email" autoComplete="email" inputMode="email" {...form.register('email')} />}
      </Field>
      <Button type="submit" fullWidth busy={request.isPending} busyLabel="Sending…">
        Send the reset link
      </Button>
    </form>
  );
}
