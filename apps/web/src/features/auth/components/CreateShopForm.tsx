import { RegisterRequest, type SessionResponse } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRegisterShop } from '../api/register';

type CreateShopInput = z.input<typeof RegisterRequest>;
type CreateShopValues = z.output<typeof RegisterRequest>;
const fieldNames = ['shopName', 'name', 'email', 'password'] as const;

export function CreateShopForm({ onCreated }: { onCreated: (session: SessionResponse) => unknown }) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<CreateShopInput, unknown, CreateShopValues>({
    resolver: zodResolver(RegisterRequest),
    defaultValues: { shopName: '', name: '', email: '', password: '' },
  });
  const register = useRegisterShop({ onSuccess: onCreated });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      // The shop lives where the person setting it up is; the lead can change its zone later in the settings.
      await register.mutateAsync({ ...values, timeZone: browserTimeZone() });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label="Create a shop">
      <FormAlert message={formError} title="Could not create the shop" />
      <Field label="Shop name" hint="The name your team will see, e.g. the workshop or business name." error={errors.shopName?.message} required>
        {(control) => <Input {...control} autoComplete="organization" {...form.register('shopName')} />}
      </Field>
      <Field label="Your name" error={errors.name?.message} required>
        {(control) => <Input {...control} autoComplete="name" {...form.register('name')} />}
      </Field>
      <Field label="Email" error={errors.email?.message} required>
        {(control) => <Input {...control} type="email" autoComplete="email" inputMode="email" {...form.register('email')} />}
      </Field>
      <Field label="Password" hint="At least 8 characters." error={errors.password?.message} required>
        {(control) => <Input {...control} type="password" autoComplete="new-password" {...form.register('password')} />}
      </Field>
      <Button type="submit" fullWidth busy={register.isPending} busyLabel="Creating the shop…">
        Create the shop
      </Button>
    </form>
  );
}

function browserTimeZone(): string | undefined {
  try {
    return Intl.DateTimeFormat().resolvedOptions().timeZone || undefined;
  } catch {
    return undefined;
  }
}
