import type { UnitSystem } from '@gelpoint/core';
import { useState } from 'react';
import { Card } from '../../../components/ui/Card';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { useMoldFill } from '../api/get-mold-fill';
import { useMoldLayers } from '../api/get-mold-layers';
import { useDebouncedValue } from '../hooks/use-debounced-value';
import type { CavityFill, CavityReport, Dam, MoldView } from '../types';
import { mmPerFileUnit } from '../utils/file-units';
import { layerLines } from '../utils/layer-lines';
import { readOptionalLength } from '../utils/length-input';
import { moldCautions } from '../utils/mold-cautions';
import { warningNotes } from '../utils/mold-warnings';
import type { Vec3 } from '../utils/mould-file-reading';
import { guessUnits } from '../utils/units-guess';
import { CautionList } from './CautionList';
import { DamChoice } from './DamChoice';
import { DepthMapView } from './DepthMapView';
import { FillFigures } from './FillFigures';
import { FillLevelControl } from './FillLevelControl';
import { LayerTable } from './LayerTable';
import { LayerThicknessControl } from './LayerThicknessControl';
import { MeshFacts } from './MeshFacts';
import { MoldView3D } from './MoldView3D';
import { MoldWarnings } from './MoldWarnings';
import { UnitsHint } from './UnitsHint';
import { VolumePlot } from './VolumePlot';

// Numbers follow the slider within a blink; the heavier depth map waits until it rests.
const fillDebounceMs = 120;
const depthMapDebounceMs = 400;

// Levels travel in query keys and URLs; a micrometre is finer than any mould is cut.
function roundLevel(levelMm: number): number {
  return Math.round(levelMm * 1000) / 1000;
}

function withoutDepthMap(fill: CavityFill): CavityFill {
  const { depthMap: _dropped, ...numbers } = fill;
  return numbers;
}

export interface MoldReportProps {
  mold: MoldView;
  report: CavityReport;
  unitSystem: UnitSystem;
}

/** A measured mould: pick a level and a dam, read the numbers, see it in 3D, on the curve and on the depth map. */
export function MoldReport({ mold, report, unitSystem }: MoldReportProps) {
  const lowestMm = report.bboxMm.min[2];
  const topMm = roundLevel(report.bboxMm.max[2]);
  const spanMm = report.bboxMm.max[2] - lowestMm;
  const [heightMm, setHeightMm] = useState(spanMm);
  const [dam, setDam] = useState<Dam>(report.fillToTop.dam);
  const [layerText, setLayerText] = useState('');

  const levelMm = roundLevel(lowestMm + heightMm);
  const numbersLevel = useDebouncedValue(levelMm, fillDebounceMs);
  const mapLevel = useDebouncedValue(levelMm, depthMapDebounceMs);
  const storedAt = (level: number) => level === topMm && dam === report.fillToTop.dam;
  const numbers = useMoldFill(mold.id, { levelMm: numbersLevel, dam, depthMap: false }, storedAt(numbersLevel) ? withoutDepthMap(report.fillToTop) : undefined);
  const mapped = useMoldFill(mold.id, { levelMm: mapLevel, dam, depthMap: true }, storedAt(mapLevel) ? report.fillToTop : undefined);
  const fill = numbers.data ?? report.fillToTop;
  const depthMap = mapped.data?.depthMap;

  const maxLayer = readOptionalLength(layerText, unitSystem, 'Layer thickness');
  const maxLayerMm = maxLayer.ok ? maxLayer.value : null;
  const lines =
    maxLayerMm === null
      ? null
      : layerLines({ curve: report.curve, wettedAreaMm2: fill.wettedAreaMm2, maxDepthMm: fill.maxDepthMm, fillLevelMm: numbersLevel, maxLayerMm });
  const layerVolumes = useMoldLayers(mold.id, lines?.ok ? { levelsMm: lines.value.levelsMm.map(roundLevel), dam } : null);

  const cautions = moldCautions({
    maxDepthMm: fill.maxDepthMm,
    trappedAirMm3: fill.trappedAirMm3,
    maxLayerMm,
    layersNeeded: lines?.ok ? lines.value.layers.length : null,
    unitSystem,
  });
  const scale = mmPerFileUnit(mold.units);
  const sizeInFileUnits = [0, 1, 2].map((k) => (report.bboxMm.max[k]! - report.bboxMm.min[k]!) / scale) as Vec3;
  const unitsDoubt = guessUnits(sizeInFileUnits, mold.units).doubt !== null;
  const updating = numbers.isPlaceholderData || numbersLevel !== levelMm;

  return (
    <div className="flex flex-col gap-6">
      {unitsDoubt ? (
        <Card title="Check the units">
          <UnitsHint sizeInFileUnits={sizeInFileUnits} units={mold.units} unitSystem={unitSystem} />
          <p className="mt-2 text-sm text-ink-soft">If the unit was wrong, delete this mould and upload the file again with the right one.</p>
        </Card>
      ) : null}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card title="The mould">
          <MoldView3D
            mold={mold}
            report={report}
            fill={fill}
            levelMm={levelMm}
            layerLevelsMm={lines?.ok ? lines.value.levelsMm : []}
            footprint={depthMap}
            footprintLevelMm={mapped.data?.levelMm}
            unitSystem={unitSystem}
          />
        </Card>
        <Card title="Fill">
          <div className="flex flex-col gap-5">
            <FillLevelControl heightMm={heightMm} spanMm={spanMm} unitSystem={unitSystem} onChange={setHeightMm} />
            <DamChoice dam={dam} onChange={setDam} />
            {numbers.isError ? <ErrorAlert error={numbers.error} live="none" /> : null}
            <FillFigures fill={fill} heightMm={heightMm} unitSystem={unitSystem} updating={updating} />
            <CautionList cautions={cautions.filter((c) => c.code === 'trapped_air')} label="Cautions about air" />
          </div>
        </Card>
      </div>
      <Card title="What the analysis noticed">
        <MoldWarnings notes={warningNotes(report.warnings, fill.warnings)} />
      </Card>
      <div className="grid gap-6 xl:grid-cols-2">
        <Card title="Volume and level">
          <VolumePlot curve={report.curve} lowestMm={lowestMm} levelMm={levelMm} unitSystem={unitSystem} />
        </Card>
        <Card title="Resin depth">
          <div className="flex flex-col gap-4">
            <CautionList cautions={cautions.filter((c) => c.appliesTo.kind === 'layer')} label="Cautions about depth" />
            {depthMap ? (
              <DepthMapView map={depthMap} unitSystem={unitSystem} updating={mapped.isPlaceholderData} />
            ) : mapped.isError ? (
              <ErrorAlert error={mapped.error} live="none" />
            ) : (
              <p className="text-ink-soft">Drawing the depth map…</p>
            )}
          </div>
        </Card>
      </div>
      <Card title="Layers">
        <div className="flex flex-col gap-4">
          <LayerThicknessControl text={layerText} error={maxLayer.ok ? null : maxLayer.error.message} unitSystem={unitSystem} onChange={setLayerText} />
          {lines && !lines.ok ? <p className="font-semibold text-ember-700">{lines.error.message}</p> : null}
          {lines?.ok ? <LayerTable lines={lines.value} volumes={layerVolumes.data} dam={dam} lowestMm={lowestMm} unitSystem={unitSystem} /> : null}
          {layerVolumes.isError ? <ErrorAlert error={layerVolumes.error} live="none" /> : null}
        </div>
      </Card>
      <Card title="About the measurement">
        <MeshFacts mold={mold} report={report} unitSystem={unitSystem} />
      </Card>
      <CautionList cautions={cautions.filter((c) => c.code === 'follow_sds_tds')} label="Data sheets" />
    </div>
  );
}
