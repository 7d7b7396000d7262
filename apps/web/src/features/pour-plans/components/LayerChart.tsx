import { formatLength, formatVolume, type UnitSystem, type VolumeCurve } from '@gelpoint/core';
import { useId } from 'react';
import { layerChartGeometry, type ChartLayer } from '../utils/layer-chart';

const width = 420;
const height = 240;

export interface LayerChartProps {
  layers: readonly (ChartLayer & { index: number })[];
  curve?: VolumeCurve;
  unitSystem: UnitSystem;
}

/**
 * The layers against the cavity: level up the side, volume along the bottom, each layer a band under the
 * volume-vs-level curve. Alternate bands are hatched, and every band is labelled, so it reads without colour.
 */
export function LayerChart({ layers, curve, unitSystem }: LayerChartProps) {
  // React's ids carry characters that do not belong in a url(#…) reference.
  const hatchId = `layer-hatch-${useId().replace(/[^A-Za-z0-9_-]/g, '')}`;
  const geometry = layerChartGeometry({ layers, width, height, ...(curve ? { curve } : {}) });
  if (!geometry) return null;
  const { plot } = geometry;
  const summary = layers
    .map(
      (l) =>
        `layer ${l.index + 1} from ${formatLength(l.fromLevelMm, unitSystem).text} to ${formatLength(l.toLevelMm, unitSystem).text}, ${formatVolume(l.fillVolumeMl, unitSystem).text}`,
    )
    .join('; ');

  return (
    <figure className="flex flex-col gap-2">
      <svg viewBox={`0 0 ${width} ${height}`} role="img" aria-label={`Volume against level: ${summary}.`} className="h-auto w-full max-w-xl text-walnut-800">
        <defs>
          <pattern id={hatchId} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <rect width="6" height="6" className="fill-resin-100" />
            <line x1="0" y1="0" x2="0" y2="6" className="stroke-resin-500" strokeWidth="2" />
          </pattern>
        </defs>
        <rect x={plot.left} y={plot.top} width={plot.width} height={plot.height} className="fill-white stroke-line" />
        {geometry.bands.map((band) => (
          <polygon
            key={band.index}
            points={band.points}
            fill={band.index % 2 === 0 ? `url(#${hatchId})` : undefined}
            className={band.index % 2 === 0 ? 'stroke-resin-600' : 'fill-resin-300 stroke-resin-600'}
            strokeWidth="1"
          />
        ))}
        <polyline points={geometry.curvePoints} fill="none" className="stroke-walnut-900" strokeWidth="2" />
        {geometry.levelTicks.map((tick) => (
          <g key={tick.levelMm}>
            <line x1={plot.left - 4} x2={plot.left + plot.width} y1={tick.y} y2={tick.y} className="stroke-walnut-400" strokeDasharray="3 3" strokeWidth="1" />
            <text x={plot.left - 6} y={tick.y + 4} textAnchor="end" className="fill-current text-[11px]">
              {formatLength(tick.levelMm, unitSystem).text}
            </text>
          </g>
        ))}
        {geometry.bands.map((band) =>
          band.yBottom - band.yTop >= 14 ? (
            <text key={band.index} x={band.labelX} y={band.labelY + 4} className="fill-current text-[12px] font-semibold">
              Layer {band.index + 1}
            </text>
          ) : null,
        )}
        <text x={plot.left} y={height - 6} className="fill-current text-[11px]">
          0
        </text>
        <text x={plot.left + plot.width} y={height - 6} textAnchor="end" className="fill-current text-[11px]">
          {formatVolume(geometry.maxVolumeMl, unitSystem).text}
        </text>
      </svg>
      <figcaption className="text-sm text-ink-soft">Level from the cavity floor up the side, volume held below that level along the bottom.</figcaption>
    </figure>
  );
}
