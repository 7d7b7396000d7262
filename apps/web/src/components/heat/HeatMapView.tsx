import { formatLength, formatTemperature, type PlanPeakMap, type UnitSystem } from '@gelpoint/core';
import { useEffect, useRef } from 'react';
import { cssColour, heatColour, heatPixels, type HeatDepthMap } from './heat-colours';

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
  // The legend runs from the shop's temperature to the accepted peak, or on to the hottest spot when that is over it.
  const hottest = Math.max(limitC, peakMap.hottest.peakC);
  const at = (c: number) => ((c - shopTempC) / Math.max(1e-9, hottest - shopTempC)) * 100;
  const stop = (c: number, pct = at(c)) => `${cssColour(heatColour(c, shopTempC, limitC))} ${pct.toFixed(1)}%`;
  const stops = [stop(shopTempC), stop((shopTempC + limitC) / 2), stop(limitC), ...(hottest > limitC ? [stop(hottest, at(limitC) + 0.1)] : [])];
  const gradient = `linear-gradient(to right, ${stops.join(', ')})`;
  const limitAt = at(limitC);

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
      <div className="flex max-w-md flex-col gap-1" aria-hidden="true">
        <div className="relative h-3 rounded border border-line" style={{ background: gradient }}>
          <span className="absolute -top-1 h-5 border-l-2 border-dashed border-walnut-900" style={{ left: `${limitAt}%` }} />
        </div>
        <div className="flex justify-between text-sm text-ink-soft">
          <span>{temp(shopTempC)}</span>
          <span>accepted peak {temp(limitC)}</span>
          {hottest > limitC ? <span>{temp(hottest)}</span> : null}
        </div>
      </div>
      <figcaption className="font-semibold">{words}</figcaption>
    </figure>
  );
}
