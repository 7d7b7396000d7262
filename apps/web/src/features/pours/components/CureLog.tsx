import type { PourView, Role, Shop } from '@gelpoint/contracts';
import { formatTemperature } from '@gelpoint/core';
import { Card } from '../../../components/ui/Card';
import { useNow } from '../hooks/use-now';
import { nextLayerWindowWords, stageReachedWords, stepWords } from '../utils/cure-words';
import { hasStepAfter, productOfStep, type RunSheet } from '../utils/plan-run-sheet';
import { temperaturePlot } from '../utils/temperature-plot';
import { AddReadingForm } from './AddReadingForm';
import { CureCautions } from './CureCautions';
import { CureCheckForm } from './CureCheckForm';
import { CureChecksList } from './CureChecksList';
import { CureEvidence } from './CureEvidence';
import { CureProgressBar } from './CureProgressBar';
import { CureStageIcon } from './CureStageIcon';
import { CureStagesList } from './CureStagesList';
import { PourReminders } from './PourReminders';
import { ReadingsCsvForm } from './ReadingsCsvForm';
import { ReadingsTable } from './ReadingsTable';
import { TemperaturePlotView } from './TemperaturePlotView';

/** What the forecast ahead runs on, from the shop's temperature profile. */
function forecastWords(shop: Shop, temp: (c: number) => string): string {
  const p = shop.temperatureProfile;
  const hour = (h: number) => `${String(h).padStart(2, '0')}:00`;
  if (p.mode === 'day_night')
    return `forecast: ${temp(p.dayTempC)} from ${hour(p.dayStartHour)}, ${temp(p.nightTempC)} from ${hour(p.nightStartHour)} (the shop's day and night)`;
  if (p.mode === 'learned') return "forecast: each hour as the shop's readings of the last 7 days showed it";
  return "forecast: the plan's shop temperature";
}

/** Where the cure stands and what it rests on: temperatures, milestones, checks and reminders. */
export function CureLog({ pour, sheet, shop, viewer }: { pour: PourView; sheet: RunSheet; shop: Shop; viewer: { userId: string; role: Role } }) {
  const now = useNow(60_000);
  const { cure } = pour;
  const product = productOfStep(sheet, cure.step);
  const plot = temperaturePlot({
    readings: pour.readings,
    pouredAt: cure.pouredAt,
    asOf: new Date(now).toISOString(),
    assumedTempC: pour.assumedTempC,
    readingCarryH: shop.readingCarryH,
    product,
    unitSystem: shop.unitSystem,
    history: cure.spans,
    ahead: pour.status === 'open' ? cure.ahead : [],
  });
  const step = stepWords(cure.step);
  // The next-layer window matters only while a later seal coat or layer is still to come.
  const moreToPour = hasStepAfter(sheet, cure.step);
  const temp = (tempC: number) => formatTemperature(tempC, shop.unitSystem).text;
  return (
    <div className="flex flex-col gap-6">
      <Card title="Where the cure stands">
        <div className="flex flex-col gap-4">
          <p className="flex items-center gap-2 text-xl font-bold text-walnut-900">
            <CureStageIcon stage={cure.stageReached} className="size-7" />
            {stageReachedWords(cure.stageReached)}
          </p>
          <p className="text-ink-soft">
            {cure.pouredAt
              ? `Counting from ${step ? step.toLowerCase() : 'the last pour'} of ${cure.productName ?? product.name}.`
              : 'The cure clock starts when the first cup is logged.'}
            {cure.nextLayerWindow && moreToPour ? ` ${nextLayerWindowWords[cure.nextLayerWindow]}.` : ''}
          </p>
          <CureProgressBar cure={cure} label="Cure progress" showMarkers />
          <CureEvidence cure={cure} open={pour.status === 'open'} />
          <CureCautions cautions={cure.cautions} />
          <CureStagesList cure={cure} />
        </div>
      </Card>

      <Card title="Temperatures">
        <div className="flex flex-col gap-5">
          {plot ? (
            <TemperaturePlotView plot={plot} minimumLabel={`minimum ${temp(product.minWorkTempC)}`} forecastLabel={forecastWords(shop, temp)} />
          ) : (
            <p className="text-ink-soft">No readings yet. Log the shop temperature now and then, or import a logger’s CSV.</p>
          )}
          <ReadingsTable pourId={pour.id} readings={pour.readings} voided={pour.voidedReadings} unitSystem={shop.unitSystem} viewer={viewer} />
          <AddReadingForm pourId={pour.id} unitSystem={shop.unitSystem} product={product} />
          <ReadingsCsvForm pourId={pour.id} />
        </div>
      </Card>

      <Card title="Cure checks">
        <div className="flex flex-col gap-5">
          <CureChecksList pourId={pour.id} checks={pour.checks} />
          <CureCheckForm pourId={pour.id} />
        </div>
      </Card>

      <Card title="Reminders">
        <PourReminders reminders={pour.reminders} />
      </Card>
    </div>
  );
}
