import { formatLength, formatVolume, type UnitSystem } from '@gelpoint/core';
import { useState } from 'react';
import { Field } from '../../../components/ui/Field';
import { Input } from '../../../components/ui/Input';
import { formatArea, shopAreaUnit } from '../utils/area-format';
import { shopLengthUnit } from '../utils/length-input';
import { moldCautions } from '../utils/mold-cautions';
import { quickShapeCavity, quickShapeFields, type QuickShapeKind, type TypedShape } from '../utils/quick-shape';
import { CautionList } from './CautionList';

const shapes: readonly { kind: QuickShapeKind; label: string; hint: string }[] = [
  { kind: 'rectangle', label: 'Rectangle pocket', hint: 'Wood on all four sides.' },
  { kind: 'channel', label: 'River channel', hint: 'Wood along both long sides; the ends are closed by dams.' },
  { kind: 'cylinder', label: 'Round pocket', hint: 'A drilled or turned hollow with straight sides.' },
  { kind: 'areaDepth', label: 'Area × average depth', hint: 'Any outline: its area and a few depth readings.' },
];

/** Works out a cavity in the browser from a few measurements, for makers without a CAD file. */
export function QuickShapeForm({ unitSystem }: { unitSystem: UnitSystem }) {
  const [kind, setKind] = useState<QuickShapeKind>('rectangle');
  const [typed, setTyped] = useState<TypedShape>({});
  const fields = quickShapeFields[kind];
  const anyTyped = fields.some((spec) => (typed[spec.field] ?? '').trim() !== '');
  const result = quickShapeCavity(kind, typed, unitSystem);
  const cautions = result.ok ? moldCautions({ maxDepthMm: result.value.maxDepthMm, trappedAirMm3: 0, maxLayerMm: null, layersNeeded: null, unitSystem }) : [];

  return (
    <form aria-label="Measure the cavity" className="flex flex-col gap-5" onSubmit={(e) => e.preventDefault()}>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-base font-semibold text-ink">Shape</legend>
        <div className="grid gap-2 sm:grid-cols-2">
          {shapes.map((shape) => (
            <label
              key={shape.kind}
              className="flex min-h-touch cursor-pointer items-start gap-3 rounded-lg border border-line-strong bg-white px-3 py-2 has-[:checked]:border-walnut-800 has-[:checked]:bg-walnut-50 has-[:checked]:ring-2 has-[:checked]:ring-walnut-800"
            >
              <input
                type="radio"
                name="quick-shape"
                value={shape.kind}
                checked={kind === shape.kind}
                onChange={() => setKind(shape.kind)}
                className="mt-1 size-5 accent-walnut-800"
              />
              <span className="flex flex-col">
                <span className="font-semibold">{shape.label}</span>
                <span className="text-sm text-ink-soft">{shape.hint}</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-2">
        {fields.map((spec) => {
          const unit = spec.measure === 'area' ? shopAreaUnit(unitSystem) : shopLengthUnit(unitSystem);
          return (
            <Field key={`${kind}-${spec.field}`} label={`${spec.label} (${unit})`} hint={spec.hint} required={spec.required}>
              {(control) => (
                <Input
                  {...control}
                  inputMode="decimal"
                  autoComplete="off"
                  value={typed[spec.field] ?? ''}
                  onChange={(e) => setTyped((before) => ({ ...before, [spec.field]: e.target.value }))}
                />
              )}
            </Field>
          );
        })}
      </div>
      <div aria-live="polite">
        {result.ok ? (
          <div className="flex flex-col gap-3">
            <dl className="grid grid-cols-[minmax(0,1fr)_auto] gap-x-4 gap-y-2 rounded-lg bg-resin-50 px-4 py-3">
              <dt className="text-resin-700">Fill volume</dt>
              <dd className="text-right text-xl font-bold tabular-nums">{formatVolume(result.value.fillVolumeMl, unitSystem).text}</dd>
              <dt className="text-resin-700">Wetted area (for the seal coat){result.value.wettedAreaEstimated ? ', at least' : ''}</dt>
              <dd className="text-right font-semibold tabular-nums">{formatArea(result.value.wettedAreaMm2, unitSystem).text}</dd>
              <dt className="text-resin-700">Deepest resin</dt>
              <dd className="text-right font-semibold tabular-nums">{formatLength(result.value.maxDepthMm, unitSystem).text}</dd>
            </dl>
            {result.value.wettedAreaEstimated ? (
              <p className="text-sm text-ink-soft">Without the outline length the walls are taken as a circle of the same area, the least they can be.</p>
            ) : null}
            <CautionList cautions={cautions} label="Cautions for this cavity" />
          </div>
        ) : anyTyped ? (
          <p className="font-semibold text-ember-700">{result.error.message}</p>
        ) : (
          <p className="text-ink-soft">Type the measurements; the numbers appear as you go.</p>
        )}
      </div>
    </form>
  );
}
