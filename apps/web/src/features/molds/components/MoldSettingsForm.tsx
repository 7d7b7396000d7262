import { MoldFileUnits } from '@gelpoint/contracts';
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { isApiError } from '../../../lib/api-error';
import { errorNotice } from '../../../lib/error-notice';
import { useUpdateMold } from '../api/update-mold';
import type { MoldView, UpAxis } from '../types';
import { fileUnitWords } from '../utils/file-units';
import { moldChanges, rereads, settingsOf, type MoldSettingsValues } from '../utils/mold-changes';

const unitOptions = MoldFileUnits.options.map((units) => ({ value: units, label: fileUnitWords[units].label }));
const upOptions: { value: UpAxis; label: string }[] = [
  { value: 'z', label: 'Z is up (most CAD and CAM programs)' },
  { value: 'y', label: 'Y is up (many modelling programs)' },
  { value: 'x', label: 'X is up' },
];

export interface MoldSettingsFormProps {
  mold: MoldView;
  pieces: readonly { id: string; name: string }[];
}

/** The mould's name and piece, and the frame its file is read in: corrected here without uploading it again. */
export function MoldSettingsForm({ mold, pieces }: MoldSettingsFormProps) {
  const [values, setValues] = useState<MoldSettingsValues>(() => settingsOf(mold));
  const [formError, setFormError] = useState<string | null>(null);
  const [nameError, setNameError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const update = useUpdateMold();
  const changes = moldChanges(mold, values);
  const pieceOptions = pieces.map((p) => ({ value: p.id, label: p.name }));
  // A piece the list does not hold (beyond its first page) still shows as chosen.
  if (mold.pieceId && !pieces.some((p) => p.id === mold.pieceId)) pieceOptions.push({ value: mold.pieceId, label: 'Its piece' });

  const set = <K extends keyof MoldSettingsValues>(key: K, value: MoldSettingsValues[K]) => {
    setSaved(null);
    setValues((v) => ({ ...v, [key]: value }));
  };

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setFormError(null);
    setNameError(values.name.trim() === '' ? 'Give the mould a name.' : null);
    if (values.name.trim() === '' || Object.keys(changes).length === 0) return;
    try {
      const next = await update.mutateAsync({ moldId: mold.id, changes });
      setValues(settingsOf(next));
      setSaved(rereads(changes) ? 'Saved. The file is being read again in the corrected frame; the report follows in a moment.' : 'Saved.');
    } catch (error) {
      setFormError(isApiError(error) ? error.message : errorNotice(error).message);
    }
  };

  return (
    <form noValidate onSubmit={(e) => void submit(e)} className="flex flex-col gap-5" aria-label="Name, piece and frame">
      <FormAlert message={formError} title="Could not save the mould" />
      {saved ? (
        <p role="status" className="rounded-lg bg-resin-50 px-4 py-3 font-semibold text-walnut-900">
          {saved}
        </p>
      ) : null}
      <Field label="Mould name" error={nameError ?? undefined} required>
        {(control) => <Input {...control} maxLength={120} value={values.name} onChange={(e) => set('name', e.target.value)} />}
      </Field>
      <Field label="Piece" hint="The piece this mould is for; its page lists the mould.">
        {(control) => (
          <Select {...control} options={pieceOptions} emptyOption="No piece" value={values.pieceId} onChange={(e) => set('pieceId', e.target.value)} />
        )}
      </Field>
      <div className="grid gap-5 sm:grid-cols-2">
        <Field label="Units in the file" hint="A different unit reads the stored file again.">
          {(control) => (
            <Select {...control} options={unitOptions} value={values.units} onChange={(e) => set('units', e.target.value as MoldSettingsValues['units'])} />
          )}
        </Field>
        <Field label="Up axis" hint="A different axis reads the stored file again.">
          {(control) => <Select {...control} options={upOptions} value={values.upAxis} onChange={(e) => set('upAxis', e.target.value as UpAxis)} />}
        </Field>
      </div>
      {rereads(changes) ? (
        <p className="text-sm text-ink-soft">Saving measures the cavity again from the stored file; the report and its numbers change with the frame.</p>
      ) : null}
      <div>
        <Button type="submit" busy={update.isPending} busyLabel="Saving…" disabled={Object.keys(changes).length === 0}>
          Save changes
        </Button>
      </div>
    </form>
  );
}
