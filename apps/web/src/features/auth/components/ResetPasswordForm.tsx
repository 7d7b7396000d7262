import { Password } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { applyServerErrors } from '../../../lib/form-errors';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';

const NewPasswordFields = z.object({ password: Password, confirmPassword: z.string() }).refine((values) => values.password === values.confirmPassword, {
  path: ['confirmPassword'],
  message: 'the two passwords differ; type the same new password in both fields',
});
type NewPasswordInput = z.input<typeof NewPasswordFields>;
type NewPasswordValues = z.output<typeof NewPasswordFields>;
const fieldNames = ['password'] as const;

export function ResetPasswordForm({ token, onChanged }: { token: string; onChanged: () => unknown }) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<NewPasswordInput, unknown, NewPasswordValues>({
    resolver: zodResolver(NewPasswordFields),
    defaultValues: { password: '', confirmPassword: '' },
  });
  const confirm = useConfirmPasswordReset({ onSuccess: onChanged });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async ({ password }) => {
    setFormError(null);
    try {
      await confirm.mutateAsync({ token, password });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label="Choose a new password">
      <FormAlert message={formError} title="Could not change the password" />
      <Field label="New password" hint="At least 8 characters." error={errors.password?.message} required>
        {(control) => <Input {...control} type="password" autoComplete="new-password" {...form.register('password')} />}
      </Field>
      <Field label="New password again" error={errors.confirmPassword?.message} required>
        {(control) => <Input {...control} type="password" autoComplete="new-password" {...form.register('confirmPassword')} />}
      </Field>
      <Button type="submit" fullWidth busy={confirm.isPending} busyLabel="Saving…">
        Save the new password
      </Button>
    </form>
  );
}
