import { formatTemperature, type UnitSystem } from '@gelpoint/core';
import { cssColour, heatColour } from './heat-colours';

export interface HeatLegendProps {
  shopTempC: number;
  limitC: number;
  /** The hottest forecast peak: past the accepted peak, the legend runs on to it. */
  hottestC: number;
  unitSystem: UnitSystem;
}

/** The forecast's colour scale as a bar, from the shop's temperature to the accepted peak (dashed), or on past it. */
export function HeatLegend({ shopTempC, limitC, hottestC, unitSystem }: HeatLegendProps) {
  const temp = (c: number) => formatTemperature(c, unitSystem).text;
  const hottest = Math.max(limitC, hottestC);
  const at = (c: number) => ((c - shopTempC) / Math.max(1e-9, hottest - shopTempC)) * 100;
  const stop = (c: number, pct = at(c)) => `${cssColour(heatColour(c, shopTempC, limitC))} ${pct.toFixed(1)}%`;
  const stops = [stop(shopTempC), stop((shopTempC + limitC) / 2), stop(limitC), ...(hottest > limitC ? [stop(hottest, at(limitC) + 0.1)] : [])];
  const gradient = `linear-gradient(to right, ${stops.join(', ')})`;

  return (
    <div className="flex max-w-md flex-col gap-1" aria-hidden="true" data-testid="heat-legend">
      <div className="relative h-3 rounded border border-line" style={{ background: gradient }}>
        <span className="absolute -top-1 h-5 border-l-2 border-dashed border-walnut-900" style={{ left: `${at(limitC)}%` }} />
      </div>
      <div className="flex justify-between text-sm text-ink-soft">
        <span>{temp(shopTempC)}</span>
        <span>accepted peak {temp(limitC)}</span>
        {hottest > limitC ? <span>{temp(hottest)}</span> : null}
      </div>
    </div>
  );
}
