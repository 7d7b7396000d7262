import { UpdatePieceRequest, type Piece } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { Textarea } from '../../../components/ui/Textarea';
import { applyServerErrors } from '../../../lib/form-errors';
import { stageOptions } from '../utils/stage-options';

// Create and edit share one form; every field is present, so the edit can send the whole set.
const PieceFields = UpdatePieceRequest.required();
type PieceInput = z.input<typeof PieceFields>;
export type PieceFormValues = z.output<typeof PieceFields>;
const fieldNames = ['name', 'wood', 'notes', 'stage'] as const;

export interface PieceFormProps {
  piece?: Piece;
  submitLabel: string;
  busyLabel: string;
  save: (values: PieceFormValues) => Promise<unknown>;
  busy: boolean;
}

export function PieceForm({ piece, submitLabel, busyLabel, save, busy }: PieceFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<PieceInput, unknown, PieceFormValues>({
    resolver: zodResolver(PieceFields),
    defaultValues: {
      name: piece?.name ?? '',
      wood: piece?.wood ?? '',
      notes: piece?.notes ?? '',
      stage: piece?.stage ?? 'planning',
    },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await save(values);
      form.reset(values);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label={piece ? `Edit ${piece.name}` : 'New piece'}>
      <FormAlert message={formError} title="Could not save the piece" />
      <Field label="Name" hint="What the shop calls it, e.g. “Walnut river table, 2 m”." error={errors.name?.message} required>
        {(control) => <Input {...control} maxLength={120} {...form.register('name')} />}
      </Field>
      <Field label="Wood" hint="Species and blank, e.g. “black walnut slab, kiln dried”." error={errors.wood?.message}>
        {(control) => <Input {...control} maxLength={120} {...form.register('wood')} />}
      </Field>
      <Field label="Stage" error={errors.stage?.message} required>
        {(control) => <Select {...control} options={stageOptions} {...form.register('stage')} />}
      </Field>
      <Field label="Notes" hint="Anything the next person at the bench should know." error={errors.notes?.message}>
        {(control) => <Textarea {...control} rows={5} maxLength={4000} {...form.register('notes')} />}
      </Field>
      <div>
        <Button type="submit" busy={busy} busyLabel={busyLabel}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
