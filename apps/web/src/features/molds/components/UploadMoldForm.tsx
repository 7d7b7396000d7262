import { Id, MoldUnits, MoldUploadFields, UpAxis, type MoldView } from '@gelpoint/contracts';
import type { UnitSystem } from '@gelpoint/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { applyServerErrors } from '../../../lib/form-errors';
import { maxUploadBytes } from '../api/upload-answer';
import { useUploadMold } from '../api/upload-mold';
import type { MoldFileUnits } from '../types';
import { fileUnitWords } from '../utils/file-units';
import { asTheFileStates, effectiveUnits, mouldFileName, unitsChoices } from '../utils/upload-units';
import type { MouldFileReading } from '../utils/mould-file-reading';
import { ProgressBar } from './ProgressBar';
import { UnitsHint } from './UnitsHint';

const chooseFile = 'Choose the mould file: STL, 3MF or OBJ.';

const UploadFields = z.object({
  file: z
    .custom<FileList>((value) => typeof FileList !== 'undefined' && value instanceof FileList, { message: chooseFile })
    .refine((list) => list.length === 1, { message: chooseFile })
    .refine((list) => mouldFileName.test(list[0]?.name ?? ''), {
      message: 'Choose a file whose name ends in .stl, .3mf or .obj; export the mould from your CAD program in one of those formats.',
    })
    .refine((list) => (list[0]?.size ?? 0) <= maxUploadBytes, {
      message: 'The file is over 100 MB, more than Gelpoint takes; export it with coarser facets and try again.',
    }),
  name: MoldUploadFields.shape.name,
  units: z.union([z.literal(asTheFileStates), MoldUnits]),
  up: UpAxis,
  pieceId: z.union([z.literal(''), Id]),
});
type UploadInput = z.input<typeof UploadFields>;
type UploadValues = z.output<typeof UploadFields>;
const fieldNames = ['file', 'name', 'units', 'up', 'pieceId'] as const;

const upOptions = [
  { value: 'z', label: 'Z is up (most CAD and CAM programs)' },
  { value: 'y', label: 'Y is up (many modelling programs)' },
  { value: 'x', label: 'X is up' },
];
const formatWords: Record<MouldFileReading['format'], string> = { stl: 'an STL', '3mf': 'a 3MF', obj: 'an OBJ' };

type ReadingState = { state: 'none' } | { state: 'reading' } | { state: 'read'; reading: MouldFileReading } | { state: 'unreadable'; message: string };

export interface UploadMoldFormProps {
  pieces: readonly { id: string; name: string }[];
  defaultPieceId?: string;
  unitSystem: UnitSystem;
  onUploaded: (mold: MoldView) => unknown;
}

export function UploadMoldForm({ pieces, defaultPieceId, unitSystem, onUploaded }: UploadMoldFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const [sentShare, setSentShare] = useState(0);
  const [reading, setReading] = useState<ReadingState>({ state: 'none' });
  const cancel = useRef<AbortController | null>(null);
  const upload = useUploadMold({ onSuccess: onUploaded });
  const form = useForm<UploadInput, unknown, UploadValues>({
    resolver: zodResolver(UploadFields),
    defaultValues: { name: '', units: 'mm', up: 'z', pieceId: defaultPieceId && pieces.some((p) => p.id === defaultPieceId) ? defaultPieceId : '' },
  });
  const { errors } = form.formState;
  const files = form.watch('file') as FileList | undefined;
  const file = files?.[0];
  const units = form.watch('units');
  const fileUnits: MoldFileUnits | null = reading.state === 'read' ? reading.reading.fileUnits : null;
  const readIn = effectiveUnits(units, fileUnits);

  // The file is read here in the browser, before anything is sent: its format, a 3MF's unit, its size.
  useEffect(() => {
    if (!file) {
      setReading({ state: 'none' });
      return;
    }
    if (file.size > maxUploadBytes) return;
    let current = true;
    setReading({ state: 'reading' });
    // The readers load with the first file chosen, not with the page.
    Promise.all([file.arrayBuffer(), import('../utils/mould-file-reading')])
      .then(([buffer, { readMouldFileInBrowser }]) => {
        if (!current) return;
        const read = readMouldFileInBrowser(new Uint8Array(buffer));
        setReading(read.ok ? { state: 'read', reading: read.value } : { state: 'unreadable', message: read.error.message });
      })
      .catch(() => current && setReading({ state: 'unreadable', message: 'The browser could not read the file; choose it again.' }));
    return () => {
      current = false;
    };
  }, [file]);

  // A 3MF states its unit, which stands unless the maker picks another; other files need a unit chosen.
  useEffect(() => {
    if (fileUnits !== null) form.setValue('units', asTheFileStates);
    else if (form.getValues('units') === asTheFileStates) form.setValue('units', 'mm');
  }, [fileUnits, form]);

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSentShare(0);
    const chosen = values.file[0]!;
    cancel.current = new AbortController();
    try {
      await upload.mutateAsync({
        file: chosen,
        fileName: chosen.name,
        ...(values.units === asTheFileStates ? {} : { units: values.units }),
        up: values.up,
        name: values.name || chosen.name.replace(mouldFileName, ''),
        ...(values.pieceId ? { pieceId: values.pieceId } : {}),
        onProgress: setSentShare,
        signal: cancel.current.signal,
      });
    } catch (error) {
      if (error instanceof DOMException && error.name === 'AbortError') {
        setFormError('The upload was cancelled; nothing was saved. Upload the file again when you are ready.');
        return;
      }
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    } finally {
      cancel.current = null;
    }
  });

  const fileField = form.register('file');

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label="Upload a mould">
      <FormAlert message={formError} title="Could not upload the mould" />
      <Field
        label="Mould file"
        hint="STL (binary or ASCII), 3MF or OBJ of the mould as a solid, opening facing up. Up to 100 MB."
        error={errors.file?.message}
        required
      >
        {(control) => (
          <input
            {...control}
            type="file"
            accept=".stl,.3mf,.obj,model/stl,model/3mf,model/obj,application/sla"
            className="block w-full rounded-lg border border-line-strong bg-white px-3 py-2 text-base file:mr-3 file:rounded-md file:border-0 file:bg-walnut-800 file:px-3 file:py-2 file:font-semibold file:text-paper"
            {...fileField}
          />
        )}
      </Field>
      <div className="grid gap-5 sm:grid-cols-2">
        <Field
          label="Units in the file"
          hint={
            fileUnits === null
              ? 'STL and OBJ files carry no unit; say which one the CAD program used.'
              : `This 3MF states its unit, ${fileUnitWords[fileUnits].plural}; choose another only if the file is wrong.`
          }
          error={errors.units?.message}
          required
        >
          {(control) => <Select {...control} options={unitsChoices(fileUnits)} {...form.register('units')} />}
        </Field>
        <Field label="Up axis" hint="The file axis that points up out of the mould’s opening." error={errors.up?.message} required>
          {(control) => <Select {...control} options={upOptions} {...form.register('up')} />}
        </Field>
      </div>
      <div aria-live="polite" className="flex flex-col gap-2">
        {reading.state === 'reading' ? <p className="text-sm text-ink-soft">Reading the file…</p> : null}
        {reading.state === 'unreadable' ? <p className="text-sm font-semibold text-ember-700">{reading.message}</p> : null}
        {reading.state === 'read' ? (
          <p className="text-sm text-ink-soft">
            This is {formatWords[reading.reading.format]} file of {reading.reading.triangles.toLocaleString()} triangles
            {reading.reading.fileUnits === null ? '.' : `, in ${fileUnitWords[reading.reading.fileUnits].plural} as it states.`}
          </p>
        ) : null}
        {reading.state === 'read' && readIn !== null ? (
          <UnitsHint
            sizeInFileUnits={reading.reading.size}
            units={readIn}
            unitSystem={unitSystem}
            onChoose={(next) => form.setValue('units', next, { shouldDirty: true })}
          />
        ) : null}
      </div>
      <Field label="Name" hint="Leave empty to use the file name." error={errors.name?.message}>
        {(control) => <Input {...control} maxLength={120} {...form.register('name')} />}
      </Field>
      <Field label="Piece" hint="The piece this mould is for, if it has one yet." error={errors.pieceId?.message}>
        {(control) => (
          <Select
            {...control}
            emptyOption="No piece yet"
            options={pieces.map((piece) => ({ value: piece.id, label: piece.name }))}
            {...form.register('pieceId')}
          />
        )}
      </Field>
      {upload.isPending ? (
        <div className="flex flex-col gap-3 rounded-lg border border-line bg-paper p-4">
          <ProgressBar label={sentShare < 1 ? 'Uploading the file' : 'Sent; the server is checking the file'} share={sentShare} />
          <div>
            <Button variant="secondary" onClick={() => cancel.current?.abort()}>
              Cancel upload
            </Button>
          </div>
        </div>
      ) : null}
      <div>
        <Button type="submit" busy={upload.isPending} busyLabel="Uploading…">
          Upload and measure
        </Button>
      </div>
    </form>
  );
}
