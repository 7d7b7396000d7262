import type { UnitSystem } from '@gelpoint/core';
import { useState } from 'react';
import { Card } from '../../../components/ui/Card';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { useMoldDepthMap } from '../api/get-mold-depth-map';
import { useMoldFill } from '../api/get-mold-fill';
import { useMoldLayers } from '../api/get-mold-layers';
import { useDebouncedValue } from '../hooks/use-debounced-value';
import type { CavityReport, Dam, MoldView } from '../types';
import { mmPerFileUnit } from '../utils/file-units';
import { layerLines } from '../utils/layer-lines';
import { curveAboveFloor, curveFromLayers, floorOf, levelsToRim, rimAboveFloorMm, storedFillToTop } from '../utils/level-datum';
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
// The box dam's curve is not stored with the report: asked for at this many heights from the floor to the rim.
const boxCurvePoints = 101;

// Levels travel in query keys and URLs; a micrometre is finer than any mould is cut.
function roundLevel(levelMm: number): number {
  return Math.round(levelMm * 1000) / 1000;
}

export interface MoldReportProps {
  mold: MoldView;
  report: CavityReport;
  unitSystem: UnitSystem;
}

/**
 * A measured mould: pick a level and a dam, read the numbers, see it in 3D, on the curve and on the depth map. The
 * level is the height of the resin surface above the cavity floor, as everywhere in Gelpoint; the mould file's own
 * frame is shown beside it.
 */
export function MoldReport({ mold, report, unitSystem }: MoldReportProps) {
  const [dam, setDam] = useState<Dam>(report.fillToTop.dam);
  const floorMm = floorOf(report, dam);
  const spanMm = rimAboveFloorMm(report, dam);
  const [heightMm, setHeightMm] = useState(() => rimAboveFloorMm(report, report.fillToTop.dam));
  const [layerText, setLayerText] = useState('');

  // A dam whose floor is lower leaves more room to the rim; one whose floor is higher caps the level there.
  const levelMm = roundLevel(Math.min(heightMm, spanMm));
  const numbersLevel = useDebouncedValue(levelMm, fillDebounceMs);
  const mapLevel = useDebouncedValue(levelMm, depthMapDebounceMs);
  const stored = storedFillToTop(report);
  const storedAt = (level: number) => level === stored.levelMm && dam === stored.dam;
  const numbers = useMoldFill(mold.id, { levelMm: numbersLevel, dam, depthMap: false }, mold.analysedAt, storedAt(numbersLevel) ? stored : undefined);
  // At the report's own fill the map is the report's, a resource of its own; at any other level the fill draws one.
  const mapIsStored = storedAt(mapLevel);
  const storedMap = useMoldDepthMap(mold.id, mold.analysedAt, mapIsStored);
  const mapped = useMoldFill(mold.id, { levelMm: mapLevel, dam, depthMap: true }, mold.analysedAt, undefined, !mapIsStored);
  const fill = numbers.data ?? stored;
  // Until the first map at another level arrives, the report's own stays on screen, marked as updating.
  const drawn =
    mapIsStored || !mapped.data?.depthMap
      ? storedMap.data
        ? { map: storedMap.data, levelInMouldMm: stored.levelInMouldMm }
        : undefined
      : { map: mapped.data.depthMap, levelInMouldMm: mapped.data.levelInMouldMm };
  const depthMap = drawn?.map;
  const depthMapUpdating = !mapIsStored && (mapped.isPlaceholderData || !mapped.data?.depthMap);
  const depthMapError = mapIsStored ? storedMap.error : mapped.error;

  const boxCurve = useMoldLayers(mold.id, dam === 'box' ? { levelsMm: levelsToRim(spanMm, boxCurvePoints), dam } : null, mold.analysedAt);
  const curve = dam === 'outline' ? curveAboveFloor(report.curve, floorMm) : boxCurve.data?.dam === 'box' ? curveFromLayers(boxCurve.data) : null;

  const maxLayer = readOptionalLength(layerText, unitSystem, 'Layer thickness');
  const maxLayerMm = maxLayer.ok ? maxLayer.value : null;
  const lines =
    maxLayerMm === null || !curve
      ? null
      : layerLines({ curve, wettedAreaMm2: fill.wettedAreaMm2, maxDepthMm: fill.maxDepthMm, fillLevelMm: numbersLevel, maxLayerMm });
  const layerVolumes = useMoldLayers(mold.id, lines?.ok ? { levelsMm: lines.value.levelsMm.map(roundLevel), dam } : null, mold.analysedAt);

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
          <p className="mt-2 text-sm text-ink-soft">If the unit was wrong, correct it under “Name, piece and frame”: the stored file is read again.</p>
        </Card>
      ) : null}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card title="The mould">
          <MoldView3D
            mold={mold}
            report={report}
            fill={fill}
            floorMm={floorMm}
            levelMm={floorMm + levelMm}
            layerLevelsMm={lines?.ok ? lines.value.levelsMm.map((l) => floorMm + l) : []}
            footprint={depthMap}
            footprintLevelMm={drawn?.levelInMouldMm}
            unitSystem={unitSystem}
          />
        </Card>
        <Card title="Fill">
          <div className="flex flex-col gap-5">
            <FillLevelControl key={dam} heightMm={levelMm} spanMm={spanMm} floorInMouldMm={floorMm} unitSystem={unitSystem} onChange={setHeightMm} />
            <DamChoice dam={dam} onChange={setDam} />
            {numbers.isError ? <ErrorAlert error={numbers.error} live="none" /> : null}
            <FillFigures fill={fill} heightMm={levelMm} unitSystem={unitSystem} updating={updating} />
            <CautionList cautions={cautions.filter((c) => c.code === 'trapped_air')} label="Cautions about air" />
          </div>
        </Card>
      </div>
      <Card title="What the analysis noticed">
        <MoldWarnings notes={warningNotes(report.warnings, fill.warnings)} />
      </Card>
      <div className="grid gap-6 xl:grid-cols-2">
        <Card title="Volume and level">
          {curve ? (
            <VolumePlot curve={curve} dam={dam} levelMm={levelMm} unitSystem={unitSystem} />
          ) : boxCurve.isError ? (
            <ErrorAlert error={boxCurve.error} live="none" />
          ) : (
            <p className="text-ink-soft">Working out the curve with the box dam…</p>
          )}
        </Card>
        <Card title="Resin depth">
          <div className="flex flex-col gap-4">
            <CautionList cautions={cautions.filter((c) => c.appliesTo.kind === 'layer')} label="Cautions about depth" />
            {depthMap ? (
              <DepthMapView map={depthMap} unitSystem={unitSystem} updating={depthMapUpdating} />
            ) : depthMapError ? (
              <ErrorAlert error={depthMapError} live="none" />
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
          {lines?.ok ? <LayerTable lines={lines.value} volumes={layerVolumes.data} dam={dam} unitSystem={unitSystem} /> : null}
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
