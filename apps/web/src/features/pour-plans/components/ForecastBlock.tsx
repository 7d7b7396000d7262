import { formatTemperature, type PlanForecast, type UnitSystem } from '@gelpoint/core';
import { useState, type ReactNode } from 'react';
import { HeatMapView } from '../../../components/heat/HeatMapView';
import type { ForecastHeat, HeatDepthMap } from '../../../components/heat/heat-colours';
import { forecastCurveGeometry, forecastWords } from '../utils/forecast-words';
import { formatHours } from '../utils/plan-format';
import { HeatViewChoice, type HeatView } from './HeatViewChoice';

const width = 220;
const height = 90;
const pad = { left: 34, bottom: 16, top: 6, right: 6 };

function ForecastCurve({
  layer,
  limitC,
  unitSystem,
}: {
  layer: Extract<PlanForecast, { available: true }>['layers'][number];
  limitC: number;
  unitSystem: UnitSystem;
}) {
  const plotW = width - pad.left - pad.right;
  const plotH = height - pad.top - pad.bottom;
  const g = forecastCurveGeometry(layer.curve, limitC, plotW, plotH);
  if (!g) return null;
  const temp = (c: number) => formatTemperature(c, unitSystem).text;
  return (
    <svg
      viewBox={`0 0 ${width} ${height}`}
      role="img"
      aria-label={`Layer ${layer.index + 1}: temperature against time, rising to ${temp(layer.peakC)} after ${formatHours(layer.timeToPeakMin / 60)}; the accepted peak is ${temp(limitC)}.`}
      className="h-auto w-full max-w-xs text-walnut-800"
    >
      <g transform={`translate(${pad.left} ${pad.top})`}>
        <rect width={plotW} height={plotH} className="fill-white stroke-line" />
        {g.limitY !== null ? <line x1={0} x2={plotW} y1={g.limitY} y2={g.limitY} className="stroke-ember-700" strokeDasharray="4 3" strokeWidth="1" /> : null}
        <polyline points={g.points} fill="none" className={layer.overLimit ? 'stroke-ember-700' : 'stroke-resin-600'} strokeWidth="2" />
        <circle cx={g.peak.x} cy={g.peak.y} r="3" className="fill-walnut-900" />
        <text x={-4} y={plotH} textAnchor="end" className="fill-current text-[9px]">
          {temp(g.lowC)}
        </text>
        <text x={-4} y={8} textAnchor="end" className="fill-current text-[9px]">
          {temp(g.highC)}
        </text>
        <text x={plotW} y={plotH + 12} textAnchor="end" className="fill-current text-[9px]">
          {formatHours(g.maxTimeMin / 60)}
        </text>
      </g>
    </svg>
  );
}

/** The exotherm forecast of the plan's layers: peaks, curves, the limit in plain words, and what it rests on. */
export function ForecastBlock({
  forecast,
  unitSystem,
  spotWords,
  depthMap,
  renderMould3D,
}: {
  forecast: PlanForecast;
  unitSystem: UnitSystem;
  spotWords?: (xMm: number, yMm: number) => string;
  /** The mould's resin depth per column at the fill level: with a peak map, the forecast is drawn over it. */
  depthMap?: HeatDepthMap | undefined;
  /** The mould in 3D with its surface coloured by the forecast, offered beside the map seen from above. */
  renderMould3D?: ((heat: ForecastHeat) => ReactNode) | undefined;
}) {
  const [view, setView] = useState<HeatView>('above');
  if (!forecast.available) {
    return <p className="text-ink-soft">No heat forecast for this plan: {forecast.reason}</p>;
  }
  const words = forecastWords(forecast, unitSystem, spotWords);
  return (
    <div className="flex flex-col gap-3">
      {words.warnings.length > 0 ? (
        <div role="alert" className="rounded-lg border border-ember-700 bg-ember-50 p-3 font-semibold text-ember-700">
          {words.warnings.map((w) => (
            <p key={w}>{w}</p>
          ))}
        </div>
      ) : (
        <p>Every layer is forecast to stay under the accepted peak of {formatTemperature(forecast.limitC, unitSystem).text}.</p>
      )}
      <p>{words.basis}</p>
      {forecast.peakMap && depthMap ? (
        <div className="flex flex-col gap-3">
          {renderMould3D ? <HeatViewChoice view={view} onChange={setView} /> : null}
          {renderMould3D && view === 'mould3d' ? (
            renderMould3D({ map: depthMap, peakMap: forecast.peakMap, shopTempC: forecast.shopTempC, limitC: forecast.limitC })
          ) : (
            <HeatMapView map={depthMap} peakMap={forecast.peakMap} shopTempC={forecast.shopTempC} limitC={forecast.limitC} unitSystem={unitSystem} />
          )}
        </div>
      ) : null}
      <ul className="flex flex-col gap-3">
        {words.layers.map((l) => (
          <li key={l.index} className="flex flex-col gap-1">
            <span className={l.overLimit ? 'font-semibold text-ember-700' : ''}>{l.sentence}</span>
            <ForecastCurve layer={forecast.layers[l.index]!} limitC={forecast.limitC} unitSystem={unitSystem} />
          </li>
        ))}
      </ul>
      <p className="text-sm text-ink-soft">
        {words.calibration} {words.defaults ?? ''} The dashed line is the accepted peak.
      </p>
      <p className="text-sm text-ink-soft">
        The model cannot see your product: follow its SDS and TDS for layer thickness, batch size and safe handling. An exotherm past its limit can crack the
        piece, smoke and burn.
      </p>
    </div>
  );
}
