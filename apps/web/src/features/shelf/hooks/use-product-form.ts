import { useState } from 'react';
import type { FieldPath, FieldValues, UseFormReturn } from 'react-hook-form';
import { applyServerErrors } from '../../../lib/form-errors';
import { optionalNumber, requiredNumber } from '../../../lib/form-input';

/**
 * Saving a product's data sheet: the server's field messages land under their fields, the rest in the form alert,
 * and a good save becomes the form's new starting point so it no longer counts as changed.
 */
export function useProductForm<TInput extends FieldValues, TOutput extends TInput>(
  form: UseFormReturn<TInput, unknown, TOutput>,
  fieldNames: readonly FieldPath<TInput>[],
  save: (values: TOutput) => Promise<unknown>,
) {
  const [formError, setFormError] = useState<string | null>(null);
  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await save(values);
      form.reset(values);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });
  const number = (name: FieldPath<TInput>) => form.register(name, { setValueAs: requiredNumber });
  const optional = (name: FieldPath<TInput>) => form.register(name, { setValueAs: optionalNumber });
  return { formError, onSubmit, number, optional };
}
