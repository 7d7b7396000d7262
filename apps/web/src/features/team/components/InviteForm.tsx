import { CreateInvitationRequest, roles, type Invitation } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { DateTime } from '../../../components/ui/DateTime';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { applyServerErrors } from '../../../lib/form-errors';
import { roleDuty, roleLabel } from '../../../lib/roles';
import { useCreateInvitation } from '../api/create-invitation';

type InviteInput = z.input<typeof CreateInvitationRequest>;
type InviteValues = z.output<typeof CreateInvitationRequest>;
const fieldNames = ['email', 'role'] as const;
const roleOptions = roles.map((role) => ({ value: role, label: `${roleLabel(role)}: ${roleDuty(role)}` }));

export function InviteForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const [sent, setSent] = useState<Invitation | null>(null);
  const form = useForm<InviteInput, unknown, InviteValues>({
    resolver: zodResolver(CreateInvitationRequest),
    defaultValues: { email: '', role: 'maker' },
  });
  const invite = useCreateInvitation();
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSent(null);
    try {
      const invitation = await invite.mutateAsync(values);
      setSent(invitation);
      form.reset({ email: '', role: values.role });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label="Invite someone">
      <FormAlert message={formError} title="Could not send the invitation" />
      {sent ? (
        <Alert tone="success" title="Invitation sent">
          {sent.email} can join as {roleLabel(sent.role).toLowerCase()} until <DateTime iso={sent.expiresAt} />.
        </Alert>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Email" error={errors.email?.message} required>
          {(control) => <Input {...control} type="email" autoComplete="off" inputMode="email" {...form.register('email')} />}
        </Field>
        <Field label="Role" error={errors.role?.message} required>
          {(control) => <Select {...control} options={roleOptions} {...form.register('role')} />}
        </Field>
      </div>
      <div>
        <Button type="submit" busy={invite.isPending} busyLabel="Sending…">
          Send invitation
        </Button>
      </div>
    </form>
  );
}
