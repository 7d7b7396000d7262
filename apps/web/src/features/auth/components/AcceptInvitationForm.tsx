import { Password, requiredText, type AcceptInvitationRequest, type InvitationPreview, type SessionResponse } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { applyServerErrors } from '../../../lib/form-errors';
import { useAcceptInvitation } from '../api/accept-invitation';

// A newcomer chooses a name and a password; someone with an account proves it with the password they have.
const NewAccountFields = z.object({ name: requiredText(120, 'your name'), password: Password });
const ExistingAccountFields = z.object({ name: z.string(), password: Password });
type AcceptValues = z.output<typeof NewAccountFields>;
const fieldNames = ['name', 'password'] as const;

export interface AcceptInvitationFormProps {
  token: string;
  invitation: InvitationPreview;
  onJoined: (session: SessionResponse) => unknown;
}

export function AcceptInvitationForm({ token, invitation, onJoined }: AcceptInvitationFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const newAccount = !invitation.accountExists;
  const form = useForm<AcceptValues>({
    resolver: zodResolver(newAccount ? NewAccountFields : ExistingAccountFields),
    defaultValues: { name: '', password: '' },
  });
  const accept = useAcceptInvitation({ onSuccess: onJoined });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    const body: AcceptInvitationRequest = newAccount ? { name: values.name, password: values.password } : { password: values.password };
    try {
      await accept.mutateAsync({ token, body });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label="Join the shop">
      <FormAlert message={formError} title="Could not join the shop" />
      {newAccount ? (
        <Field label="Your name" hint="How the team will see you on run sheets and batch logs." error={errors.name?.message} required>
          {(control) => <Input {...control} autoComplete="name" {...form.register('name')} />}
        </Field>
      ) : null}
      <Field
        label={newAccount ? 'Choose a password' : 'Your password'}
        hint={newAccount ? 'At least 8 characters.' : `The password you already use for ${invitation.email}.`}
        error={errors.password?.message}
        required
      >
        {(control) => <Input {...control} type="password" autoComplete={newAccount ? 'new-password' : 'current-password'} {...form.register('password')} />}
      </Field>
      <Button type="submit" fullWidth busy={accept.isPending} busyLabel="Joining…">
        Join {invitation.shopName}
      </Button>
    </form>
  );
}
