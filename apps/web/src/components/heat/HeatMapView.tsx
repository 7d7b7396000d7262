import { formatLength, formatTemperature, type PlanPeakMap, type UnitSystem } from '@gelpoint/core';
import { useEffect, useRef } from 'react';
import { heatPixels, type HeatDepthMap } from './heat-colours';
import { HeatLegend } from './HeatLegend';

export interface HeatMapViewProps {
  map: HeatDepthMap;
  peakMap: PlanPeakMap;
  shopTempC: number;
  limitC: number;
  unitSystem: UnitSystem;
}

/** Where the pour gets hottest, in words: the peak, its layer and its place in the mould's own frame. */
export function hottestSpotWords(peakMap: PlanPeakMap, limitC: number, unitSystem: UnitSystem): string {
  const h = peakMap.hottest;
  const temp = (c: number) => formatTemperature(c, unitSystem).text;
  const len = (mm: number) => formatLength(mm, unitSystem).text;
  const over = h.peakC > limitC ? `, over the accepted peak of ${temp(limitC)}` : '';
  return `Hottest spot: ${temp(h.peakC)} in layer ${h.layerIndex + 1}${over}, at x ${len(h.xMm)}, y ${len(h.yMm)} in the mould file's frame.`;
}

/**
 * The forecast peak temperature over the mould, seen from above: each column coloured by the peak its resin depth
 * reaches, a legend in the shop's unit with the accepted peak marked, and the hottest spot ringed and named.
 */
export function HeatMapView({ map, peakMap, shopTempC, limitC, unitSystem }: HeatMapViewProps) {
  const canvas = useRef<HTMLCanvasElement>(null);
  useEffect(() => {
    const ctx = canvas.current?.getContext('2d');
    if (!ctx) return;
    ctx.putImageData(new ImageData(heatPixels(map, peakMap.bands, shopTempC, limitC), map.nx, map.ny), 0, 0);
  }, [map, peakMap, shopTempC, limitC]);

  const temp = (c: number) => formatTemperature(c, unitSystem).text;
  const words = hottestSpotWords(peakMap, limitC, unitSystem);
  const widthMm = map.nx * map.cellMm[0];
  const depthMm = map.ny * map.cellMm[1];
  // The ring at the hottest column, in percent of the drawing (y flipped: the far edge is at the top).
  const ringX = ((peakMap.hottest.xMm - map.originMm[0]) / widthMm) * 100;
  const ringY = (1 - (peakMap.hottest.yMm - map.originMm[1]) / depthMm) * 100;

  return (
    <figure className="flex flex-col gap-2" aria-label="Forecast peak temperature over the mould">
      <div className="relative w-full max-w-md" style={{ aspectRatio: `${widthMm} / ${depthMm}` }}>
        <canvas
          ref={canvas}
          width={map.nx}
          height={map.ny}
          role="img"
          aria-label={`Map of the forecast peak temperature seen from above, from ${temp(shopTempC)} (pale) to ${temp(limitC)} at the accepted peak (brick red). ${words}`}
          className="h-full w-full rounded border border-line bg-white [image-rendering:pixelated]"
        />
        <span
          aria-hidden="true"
          className="absolute size-5 -translate-x-1/2 -translate-y-1/2 rounded-full border-2 border-walnut-900 ring-2 ring-white"
          style={{ left: `${ringX}%`, top: `${ringY}%` }}
        />
      </div>
      <HeatLegend shopTempC={shopTempC} limitC={limitC} hottestC={peakMap.hottest.peakC} unitSystem={unitSystem} />
      <figcaption className="font-semibold">{words}</figcaption>
    </figure>
  );
}
