import { LoginRequest, type SessionResponse } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { applyServerErrors } from '../../../lib/form-errors';
import { useSignIn } from '../api/sign-in';

const SignInFields = LoginRequest.pick({ email: true, password: true });
type SignInInput = z.input<typeof SignInFields>;
type SignInValues = z.output<typeof SignInFields>;
const fieldNames = ['email', 'password'] as const;

export function SignInForm({ onSignedIn }: { onSignedIn: (session: SessionResponse) => unknown }) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<SignInInput, unknown, SignInValues>({
    resolver: zodResolver(SignInFields),
    defaultValues: { email: '', password: '' },
  });
  const signIn = useSignIn({ onSuccess: onSignedIn });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await signIn.mutateAsync(values);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label="Sign in">
      <FormAlert message={formError} title="Could not sign in" />
      <Field label="Email" error={errors.email?.message} required>
        {(control) => <Input {...control} type="email" autoComplete="email" inputMode="email" {...form.register('email')} />}
      </Field>
      <Field label="Password" error={errors.password?.message} required>
        {(control) => <Input {...control} type="password" autoComplete="current-password" {...form.register('password')} />}
      </Field>
      <Button type="submit" fullWidth busy={signIn.isPending} busyLabel="Signing in…">
        Sign in
      </Button>
    </form>
  );
}
