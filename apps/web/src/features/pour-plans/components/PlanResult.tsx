import {
  formatLength,
  formatTemperature,
  formatVolume,
  formatWeighedMass,
  type PlannedBatch,
  type PourPlan,
  type TimesAtTemperature,
  type UnitSystem,
  type VolumeCurve,
} from '@gelpoint/core';
import type { ReactNode } from 'react';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';
import { cautionsFor } from '../utils/caution-words';
import { formatMoney } from '../../../lib/money';
import { formatArea, formatHours, formatMinutes } from '../utils/plan-format';
import { CautionList } from './CautionList';
import type { ForecastHeat, HeatDepthMap } from '../../../components/heat/heat-colours';
import { ForecastBlock } from './ForecastBlock';
import { LayerChart } from './LayerChart';

export interface PlanResultProps {
  plan: PourPlan;
  unitSystem: UnitSystem;
  /** The shop's ISO 4217 code: every cost of the plan is in it. */
  currency: string;
  /** The cavity's own curve, when known, for the drawing; otherwise it runs straight between layer boundaries. */
  curve?: VolumeCurve;
  /** A mould's resin depth per column at the fill level, to draw the forecast peak over it. */
  depthMap?: HeatDepthMap | undefined;
  /** The mould in 3D coloured by the forecast peak, offered beside the map seen from above. */
  renderMould3D?: ((heat: ForecastHeat) => ReactNode) | undefined;
}

function Facts({ rows }: { rows: readonly { term: string; value: ReactNode }[] }) {
  return (
    <dl className="grid gap-x-4 gap-y-2 sm:grid-cols-[minmax(0,1fr)_auto]">
      {rows.map((row) => (
        <div key={row.term} className="contents">
          <dt className="text-ink-soft">{row.term}</dt>
          <dd className="font-semibold sm:text-right">{row.value}</dd>
        </div>
      ))}
    </dl>
  );
}

function Block({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-3 rounded-xl border border-line bg-white p-4 break-inside-avoid">
      <h3 className="text-lg font-bold text-walnut-900">{title}</h3>
      {children}
    </section>
  );
}

function BatchTable({
  caption,
  batches,
  plan,
  unitSystem,
  currency,
}: {
  caption: string;
  batches: readonly PlannedBatch[];
  plan: PourPlan;
  unitSystem: UnitSystem;
  currency: string;
}) {
  const grams = (g: number) => formatWeighedMass(g, unitSystem, plan.resolution.grams).text;
  const millilitres = (ml: number) => formatVolume(ml, unitSystem).text;
  return (
    <Table caption={caption}>
      <Thead>
        <tr>
          <Th>Cup</Th>
          <Th>Part A</Th>
          <Th>Part B</Th>
          <Th>Pigment</Th>
          <Th>Total</Th>
          <Th>Cost</Th>
        </tr>
      </Thead>
      <tbody>
        {batches.map((batch) => {
          const cautions = cautionsFor(plan.cautions, 'batch', batch.index);
          return (
            <Tr key={batch.index}>
              <Td className="font-semibold">
                {batch.index + 1}
                {cautions.length > 0 ? (
                  <CautionList cautions={cautions} className="mt-2 min-w-64 font-normal" label={`Cautions for cup ${batch.index + 1}`} />
                ) : null}
              </Td>
              <Td>
                {grams(batch.partA.grams)}
                <span className="block text-sm text-ink-soft">{millilitres(batch.partA.ml)}</span>
              </Td>
              <Td>
                {grams(batch.partB.grams)}
                <span className="block text-sm text-ink-soft">{millilitres(batch.partB.ml)}</span>
              </Td>
              <Td>{batch.pigment.grams > 0 ? grams(batch.pigment.grams) : 'none'}</Td>
              <Td className="font-semibold">{grams(batch.totalGrams)}</Td>
              <Td>{formatMoney(batch.cost.total, currency)}</Td>
            </Tr>
          );
        })}
      </tbody>
    </Table>
  );
}

function TimesFacts({ times, unitSystem }: { times: TimesAtTemperature; unitSystem: UnitSystem }) {
  return (
    <>
      {times.belowMinimum ? (
        <p className="font-semibold text-ember-700">
          Below this product&apos;s minimum working temperature: the cure goes on only slowly, and the data sheet does not promise it finishes. The times below
          follow the chemistry; warm the shop and the resin before pouring.
        </p>
      ) : null}
      <Facts
        rows={[
          { term: 'Pot life', value: formatMinutes(times.potLifeMin) },
          { term: 'Gel', value: formatHours(times.gelTimeH) },
          { term: 'Next layer window opens', value: formatHours(times.nextLayerOpensH) },
          { term: 'Tack-free', value: formatHours(times.tackFreeH) },
          { term: 'Next layer window closes', value: formatHours(times.nextLayerClosesH) },
          { term: 'Demold', value: formatHours(times.demoldH) },
          { term: 'Full cure', value: formatHours(times.fullCureH) },
          { term: 'Ready to machine', value: formatHours(times.readyToMachineH) },
        ]}
      />
      <p className="text-sm text-ink-soft">
        At {formatTemperature(times.tempC, unitSystem).text}, the cure runs at {times.rateFactor.toFixed(2)} × its data-sheet rate.
      </p>
    </>
  );
}

function forecastRow(plan: PourPlan, index: number, unitSystem: UnitSystem): { term: string; value: ReactNode }[] {
  const layer = plan.forecast.available ? plan.forecast.layers[index] : undefined;
  if (!layer) return [];
  const value = `${formatTemperature(layer.peakC, unitSystem).text}${layer.overLimit ? ', over the accepted peak' : ''}`;
  return [{ term: 'Forecast peak (estimate)', value }];
}

/** A pour plan's numbers: the same view for the live planner and for a saved plan's stored result. */
export function PlanResult({ plan, unitSystem, currency, curve, depthMap, renderMould3D }: PlanResultProps) {
  const money = (amount: number) => formatMoney(amount, currency);
  const volume = (ml: number) => formatVolume(ml, unitSystem).text;
  const length = (mm: number) => formatLength(mm, unitSystem).text;
  const grams = (g: number) => formatWeighedMass(g, unitSystem, plan.resolution.grams).text;
  const totalGrams = (plan.sealCoat?.totals.totalGrams ?? 0) + plan.deepPour.totals.totalGrams;
  const batchCount = plan.margins.cupWaste.batches;
  const deepCautions = cautionsFor(plan.cautions, 'product', 0);
  const sealCautions = cautionsFor(plan.cautions, 'product', 1);
  const pigmentCautions = cautionsFor(plan.cautions, 'pigment');

  return (
    <div className="flex flex-col gap-4">
      <Block title="At a glance">
        <Facts
          rows={[
            { term: 'Fill volume', value: volume(plan.fill.fillVolumeMl) },
            { term: `To pour, with ${plan.margins.overPour.pct} % over-pour`, value: volume(plan.fill.pourVolumeMl) },
            { term: 'Layers', value: `${plan.fill.layerCount} × ${length(plan.fill.layerThicknessMm)}` },
            { term: 'Cups to mix', value: String(batchCount) },
            { term: 'Resin to weigh out, A + B + pigment', value: grams(totalGrams) },
            { term: 'Cost of the piece', value: money(plan.cost.piece) },
          ]}
        />
      </Block>

      <Block title="Layers against the cavity">
        <LayerChart layers={plan.layers} unitSystem={unitSystem} {...(curve ? { curve } : {})} />
      </Block>

      <Block title="Heat forecast (an estimate)">
        <ForecastBlock forecast={plan.forecast} unitSystem={unitSystem} depthMap={depthMap} renderMould3D={renderMould3D} />
      </Block>

      <Block title={`Deep pour: ${plan.deepPour.productName}`}>
        <CautionList cautions={deepCautions} label="Cautions for the deep-pour product" />
        {plan.deepPour.pigmentName ? (
          <p>
            Pigment: {plan.deepPour.pigmentName} at {plan.deepPour.pigmentPct} % of part A + part B by mass.
          </p>
        ) : (
          <p>No pigment.</p>
        )}
        <CautionList cautions={pigmentCautions} label="Cautions for the pigment" />
        <Facts
          rows={[
            { term: 'Part A', value: grams(plan.deepPour.totals.partA.grams) },
            { term: 'Part B', value: grams(plan.deepPour.totals.partB.grams) },
            { term: 'Pigment', value: grams(plan.deepPour.totals.pigment.grams) },
            { term: 'Deep pour cost', value: money(plan.cost.deepPour) },
          ]}
        />
      </Block>

      {plan.sealCoat ? (
        <Block title={`Seal coat: ${plan.sealCoat.productName}`}>
          <CautionList cautions={sealCautions} label="Cautions for the seal-coat product" />
          <Facts
            rows={[
              { term: 'Wetted area', value: formatArea(plan.sealCoat.wettedAreaMm2, unitSystem) },
              { term: 'Film', value: `${length(plan.sealCoat.filmThicknessMm)} × absorption ${plan.sealCoat.absorptionFactor}` },
              { term: 'Coats', value: `${plan.sealCoat.coats.length} × ${volume(plan.sealCoat.coats[0]?.volumeMl ?? 0)}` },
              { term: 'Seal coat cost', value: money(plan.cost.sealCoat) },
            ]}
          />
          {plan.sealCoat.coats.map((coat) => (
            <BatchTable
              key={coat.index}
              caption={`Seal coat ${coat.index + 1}: cups to mix`}
              batches={coat.batches}
              plan={plan}
              unitSystem={unitSystem}
              currency={currency}
            />
          ))}
        </Block>
      ) : null}

      {plan.layers.map((layer) => (
        <Block key={layer.index} title={`Layer ${layer.index + 1} of ${plan.layers.length}`}>
          <CautionList cautions={cautionsFor(plan.cautions, 'layer', layer.index)} label={`Cautions for layer ${layer.index + 1}`} />
          <Facts
            rows={[
              { term: 'Level', value: `${length(layer.fromLevelMm)} to ${length(layer.toLevelMm)}` },
              { term: 'Thickness', value: length(layer.thicknessMm) },
              ...forecastRow(plan, layer.index, unitSystem),
              { term: 'Fill', value: volume(layer.fillVolumeMl) },
              { term: 'Over-pour', value: volume(layer.overPourMl) },
              { term: 'To pour', value: volume(layer.pourVolumeMl) },
              { term: 'Layer total', value: grams(layer.totals.totalGrams) },
              { term: 'Layer cost', value: money(layer.cost.total) },
            ]}
          />
          <BatchTable caption={`Layer ${layer.index + 1}: cups to mix`} batches={layer.batches} plan={plan} unitSystem={unitSystem} currency={currency} />
        </Block>
      ))}

      <Block title={`Times at ${formatTemperature(plan.shopTimes.deepPour.tempC, unitSystem).text}`}>
        <h4 className="font-semibold">{plan.deepPour.productName}</h4>
        <TimesFacts times={plan.shopTimes.deepPour} unitSystem={unitSystem} />
        {plan.shopTimes.sealCoat && plan.sealCoat ? (
          <>
            <h4 className="mt-2 font-semibold">{plan.sealCoat.productName} (seal coat)</h4>
            <TimesFacts times={plan.shopTimes.sealCoat} unitSystem={unitSystem} />
          </>
        ) : null}
      </Block>

      <Block title="Cost">
        <Facts
          rows={[
            { term: 'Seal coat', value: money(plan.cost.sealCoat) },
            { term: 'Deep pour', value: money(plan.cost.deepPour) },
            ...(plan.cost.wood
              ? [
                  {
                    term: `Wood, ${plan.cost.wood.boardFeet.toFixed(2)} board feet at ${money(plan.cost.wood.pricePerBoardFoot)}`,
                    value: money(plan.cost.wood.shownCost),
                  },
                ]
              : []),
            { term: 'Piece', value: money(plan.cost.piece) },
          ]}
        />
        <p className="text-sm text-ink-soft">
          Margins included: {plan.margins.overPour.label.toLowerCase()} {plan.margins.overPour.pct} % ({volume(plan.margins.overPour.volumeMl)}),{' '}
          {plan.margins.cupWaste.label.toLowerCase()}{' '}
          {'massG' in plan.margins.cupWaste.perBatch ? grams(plan.margins.cupWaste.perBatch.massG) : volume(plan.margins.cupWaste.perBatch.volumeMl)} (
          {grams(plan.margins.cupWaste.resinG)} over {plan.margins.cupWaste.batches} cups).
        </p>
      </Block>

      <Block title="Before and during the pour">
        <CautionList cautions={cautionsFor(plan.cautions, 'plan')} label="Cautions for the whole pour" />
      </Block>
    </div>
  );
}
