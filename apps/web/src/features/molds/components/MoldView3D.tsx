import { formatLength, formatTemperature, formatVolume, mm3ToMl, type UnitSystem } from '@gelpoint/core';
import { lazy, Suspense, useId } from 'react';
import type { ForecastHeat } from '../../../components/heat/heat-colours';
import { HeatLegend } from '../../../components/heat/HeatLegend';
import { hottestSpotWords } from '../../../components/heat/HeatMapView';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { Spinner } from '../../../components/ui/Spinner';
import { useMoldStl } from '../api/get-mold-stl';
import type { CavityFill, CavityReport, DepthMap, MoldView } from '../types';
import { SceneErrorBoundary } from './SceneErrorBoundary';

// three.js and the renderer load only when a mould's page draws it, never with the rest of the app.
const MoldScene = lazy(() => import('./MoldScene'));

export interface MoldView3DProps {
  mold: MoldView;
  report: CavityReport;
  fill: CavityFill;
  /** The cavity floor, and the level, in the mould's own frame (mm). */
  floorMm: number;
  levelMm: number;
  layerLevelsMm: readonly number[];
  footprint: DepthMap | undefined;
  /** The level the footprint was measured at. */
  footprintLevelMm: number | undefined;
  unitSystem: UnitSystem;
  /** A plan's forecast peak per column: the resin surface is coloured by it, with the legend and the hottest spot. */
  heat?: ForecastHeat | undefined;
}

/** The mould in 3D with its resin surface at the level; given a forecast, that surface shows the forecast peak. */
export function MoldView3D({ mold, report, fill, floorMm, levelMm, layerLevelsMm, footprint, footprintLevelMm, unitSystem, heat }: MoldView3DProps) {
  const descriptionId = useId();
  const temp = (c: number) => formatTemperature(c, unitSystem).text;
  const stl = useMoldStl(mold.id);
  const size = [0, 1, 2].map((k) => formatLength(report.bboxMm.max[k]! - report.bboxMm.min[k]!, unitSystem).text).join(' × ');
  const layers =
    layerLevelsMm.length > 2
      ? ` Layer lines at ${layerLevelsMm
          .slice(1)
          .map((z) => formatLength(z - floorMm, unitSystem).text)
          .join(', ')} above the cavity floor: the outline on the cavity of each layer's surface.`
      : '';
  const fallback = (
    <div className="flex h-full items-center justify-center">
      <Spinner label="Loading the 3D view…" />
    </div>
  );

  return (
    <figure className="flex flex-col gap-2" {...(heat ? { 'aria-label': 'Forecast peak temperature on the mould in 3D' } : {})}>
      <div className="h-80 overflow-hidden rounded-xl border border-line bg-paper sm:h-96" data-testid="mold-3d">
        <SceneErrorBoundary>
          {stl.data ? (
            <Suspense fallback={fallback}>
              <MoldScene
                file={stl.data}
                upAxis={mold.upAxis}
                units={mold.units}
                bboxMm={report.bboxMm}
                levelMm={levelMm}
                layerLevelsMm={layerLevelsMm}
                footprint={footprint}
                footprintLevelMm={footprintLevelMm}
                heat={heat}
                describedBy={descriptionId}
              />
            </Suspense>
          ) : stl.isError ? (
            <div className="p-4">
              <ErrorAlert error={stl.error} live="none" />
            </div>
          ) : (
            fallback
          )}
        </SceneErrorBoundary>
      </div>
      {heat ? <HeatLegend shopTempC={heat.shopTempC} limitC={heat.limitC} hottestC={heat.peakMap.hottest.peakC} unitSystem={unitSystem} /> : null}
      <figcaption id={descriptionId} className="flex flex-col gap-1">
        {heat ? (
          <>
            <span className="font-semibold">{hottestSpotWords(heat.peakMap, heat.limitC, unitSystem)}</span>
            <span className="text-sm text-ink-soft">
              The resin surface is coloured by the forecast peak of the resin below it, an estimate, from {temp(heat.shopTempC)} (pale) to {temp(heat.limitC)}{' '}
              at the accepted peak (brick red); plum is over it. The hottest spot is ringed.
            </span>
          </>
        ) : null}
        <span className="text-sm text-ink-soft">
          The mould, {size}, Z up as measured. The resin surface stands {formatLength(levelMm - floorMm, unitSystem).text} above the cavity floor:{' '}
          {formatVolume(mm3ToMl(fill.volumeMm3), unitSystem).text}, {formatLength(fill.maxDepthMm, unitSystem).text} deep at the deepest spot.{layers}
        </span>
      </figcaption>
    </figure>
  );
}
