import { fastHeatShareOfMaxBatch, formatMass, handlingCautions, type UnitSystem } from '@gelpoint/core';
import { Alert } from '../../../components/ui/Alert';
import type { RunSheetCup } from '../utils/plan-run-sheet';

const atTheCup = new Set(['ventilation', 'skin_protection', 'eye_protection']);

/** What to have on and around before A meets B, plus the plan's own warnings about this cup's heat. */
export function MixingCautions({ cup, unitSystem }: { cup: RunSheetCup; unitSystem: UnitSystem }) {
  const general = handlingCautions().filter((c) => atTheCup.has(c.code));
  const deferral = handlingCautions().find((c) => c.code === 'follow_sds_tds');
  const heatsFast = cup.totalG >= fastHeatShareOfMaxBatch * cup.product.maxBatchG;
  const planSaysHeat = cup.cautions.some((c) => c.code === 'cup_heat_builds_fast' || c.code === 'batch_too_heavy');
  return (
    <div className="flex flex-col gap-3">
      {cup.cautions.map((c) => (
        <Alert key={c.code} tone={c.severity === 'danger' ? 'error' : 'warning'} live="none" title={c.severity === 'danger' ? 'Danger: exotherm' : 'Exotherm'}>
          {c.message}
        </Alert>
      ))}
      {heatsFast && !planSaysHeat ? (
        <Alert tone="warning" live="none" title="Exotherm">
          This cup is {formatMass(cup.totalG, unitSystem).text}, at least half the {formatMass(cup.product.maxBatchG, unitSystem).text} most that “
          {cup.product.name}” allows in one batch: it heats itself quickly. Mix it, then pour it out at once; never leave it standing in the cup.
        </Alert>
      ) : null}
      <Alert tone="info" live="none" title="Before you open the cans">
        <ul className="flex list-disc flex-col gap-1 pl-5">
          {general.map((c) => (
            <li key={c.code}>{c.message}</li>
          ))}
        </ul>
        {deferral ? <p className="mt-2 text-sm">{deferral.message}</p> : null}
      </Alert>
    </div>
  );
}
