import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { Field, FieldError } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { Textarea } from '../../../components/ui/Textarea';
import { ProgressBar } from '../../../components/ui/ProgressBar';
import { applyServerErrors } from '../../../lib/form-errors';
import type { UploadProgress } from '../../../lib/upload-with-progress';
import { useAddCureCheck } from '../api/add-cure-check';
import { checkStageWords } from '../utils/cure-words';
import { toLocalInput } from '../utils/local-time';
import { downscalePhoto } from '../utils/downscale-photo';
import { photoProblem } from '../utils/photo-check';
import { cureCheckFormSchema, cureCheckStages, type CureCheckFormInput, type CureCheckFormValues } from '../utils/reading-form';

const fieldNames = ['stage', 'checkedAt', 'hardness', 'note'] as const;
const stageOptions = cureCheckStages.map((stage) => ({ value: stage, label: checkStageWords[stage] }));

const blank = (): CureCheckFormInput => ({ stage: '', checkedAt: toLocalInput(new Date()), hardness: '', note: '' });

/** What the surface was like when someone pressed it, with a durometer reading and a photo when there is one. */
export function CureCheckForm({ pourId }: { pourId: string }) {
  const form = useForm<CureCheckFormInput, unknown, CureCheckFormValues>({ resolver: zodResolver(cureCheckFormSchema), defaultValues: blank() });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const [photoError, setPhotoError] = useState<string | null>(null);
  const [saved, setSaved] = useState<'sent' | 'kept' | null>(null);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [preparing, setPreparing] = useState(false);
  const photoRef = useRef<HTMLInputElement>(null);
  const photoId = useId();
  const photoHintId = useId();
  const add = useAddCureCheck(pourId, setProgress);

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSaved(null);
    setProgress(null);
    const picked = photoRef.current?.files?.[0] ?? null;
    // Straight from the camera: drawn smaller in the browser first, then checked against the API's limits.
    setPreparing(picked !== null);
    const photo = picked ? await downscalePhoto(picked) : null;
    setPreparing(false);
    const problem = photo ? photoProblem(photo) : null;
    setPhotoError(problem?.message ?? null);
    if (problem) return;
    try {
      const answer = await add.mutateAsync({ stage: values.stage, checkedAt: values.checkedAt, hardnessShoreD: values.hardness, note: values.note, photo });
      form.reset(blank());
      if (photoRef.current) photoRef.current.value = '';
      setSaved(answer.queued ? 'kept' : 'sent');
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    } finally {
      setProgress(null);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Add a cure check" className="flex flex-col gap-4">
      <FormAlert message={formError} title="The check was not saved" />
      {saved === 'sent' ? <Alert tone="success">Cure check saved.</Alert> : null}
      {saved === 'kept' ? <Alert tone="info">Cure check kept on this phone; it is sent when the connection returns.</Alert> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="What the resin was like" error={errors.stage?.message} required>
          {(control) => <Select {...control} className="min-h-12!" emptyOption="Choose…" options={stageOptions} {...form.register('stage')} />}
        </Field>
        <Field label="Time of check" error={errors.checkedAt?.message} required>
          {(control) => <Input {...control} type="datetime-local" className="min-h-12!" {...form.register('checkedAt')} />}
        </Field>
        <Field label="Hardness (Shore D)" hint="From a durometer, if you have one." error={errors.hardness?.message}>
          {(control) => <Input {...control} inputMode="decimal" autoComplete="off" className="min-h-12! text-xl tabular-nums" {...form.register('hardness')} />}
        </Field>
        <div className="flex flex-col gap-1.5">
          <label htmlFor={photoId} className="text-base font-semibold text-ink">
            Photo
          </label>
          <p id={photoHintId} className="text-sm text-ink-soft">
            Take it with the camera; it is sent at most 1600 px wide (JPEG, PNG or WebP, up to 8 MB).
          </p>
          <input
            ref={photoRef}
            id={photoId}
            type="file"
            accept="image/*"
            capture="environment"
            aria-describedby={photoHintId}
            aria-invalid={photoError ? true : undefined}
            className="min-h-12 rounded-lg border border-line-strong bg-white p-2 file:mr-3 file:min-h-10 file:rounded-md file:border-0 file:bg-walnut-100 file:px-3 file:font-semibold"
          />
          {photoError ? <FieldError>{photoError}</FieldError> : null}
        </div>
      </div>
      <Field label="Note" error={errors.note?.message}>
        {(control) => <Textarea {...control} rows={3} maxLength={2000} {...form.register('note')} />}
      </Field>
      {progress && add.isPending ? (
        <ProgressBar
          label="Sending the photo"
          percent={Math.round((100 * progress.sentBytes) / Math.max(1, progress.totalBytes))}
          reading={`${Math.round((100 * progress.sentBytes) / Math.max(1, progress.totalBytes))} %`}
          valueText={`${Math.round((100 * progress.sentBytes) / Math.max(1, progress.totalBytes))} % sent`}
        />
      ) : null}
      <div>
        <Button type="submit" className="min-h-12!" busy={add.isPending || preparing} busyLabel={preparing ? 'Preparing the photo…' : 'Saving…'}>
          Save the check
        </Button>
      </div>
    </form>
  );
}
