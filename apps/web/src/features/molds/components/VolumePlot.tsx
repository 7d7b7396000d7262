import { formatLength, formatVolume, mm3ToMl, type UnitSystem, type VolumeCurve } from '@gelpoint/core';
import { useId } from 'react';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';
import type { Dam } from '../types';
import { curveRows, volumePlot } from '../utils/volume-plot';
import { damWords } from './DamChoice';

const box = { width: 520, height: 280, left: 64, right: 16, top: 16, bottom: 48 };

function tickText(value: number): string {
  return Number(value.toPrecision(6)).toString();
}

export interface VolumePlotProps {
  /** Levels measured from the cavity floor, as the fill level is. */
  curve: VolumeCurve;
  dam: Dam;
  /** The chosen level, above the cavity floor. */
  levelMm: number;
  unitSystem: UnitSystem;
}

/** How the volume grows with the level, with the chosen level marked; a table below says the same in numbers. */
export function VolumePlot({ curve, dam, levelMm, unitSystem }: VolumePlotProps) {
  const titleId = useId();
  const summaryId = useId();
  const plot = volumePlot(curve, 0, unitSystem, levelMm, box);
  const top = curve[curve.length - 1];
  const bottomY = box.height - box.bottom;
  const summary = top
    ? `The mould holds ${formatVolume(mm3ToMl(top.volumeMm3), unitSystem).text} with the resin at its top, ${formatLength(top.levelMm, unitSystem).text} above the cavity floor. The marker shows the chosen level, ${formatLength(levelMm, unitSystem).text}.`
    : 'The report has no curve.';

  return (
    <figure className="flex flex-col gap-3">
      <svg viewBox={`0 0 ${box.width} ${box.height}`} role="img" aria-labelledby={titleId} aria-describedby={summaryId} className="w-full max-w-2xl">
        <title id={titleId}>Volume against fill level, {damWords[dam]}</title>
        <g className="text-line-strong" stroke="currentColor" strokeWidth="1">
          <line x1={box.left} y1={bottomY} x2={box.width - box.right} y2={bottomY} />
          <line x1={box.left} y1={box.top} x2={box.left} y2={bottomY} />
        </g>
        {plot.xTicks.map((tick) => (
          <g key={`x${tick.value}`}>
            <line x1={tick.at} x2={tick.at} y1={box.top} y2={bottomY} className="stroke-line" strokeDasharray="2 4" />
            <text x={tick.at} y={bottomY + 18} textAnchor="middle" className="fill-ink-soft text-[12px]">
              {tickText(tick.value)}
            </text>
          </g>
        ))}
        {plot.yTicks.map((tick) => (
          <g key={`y${tick.value}`}>
            <line x1={box.left} x2={box.width - box.right} y1={tick.at} y2={tick.at} className="stroke-line" strokeDasharray="2 4" />
            <text x={box.left - 8} y={tick.at + 4} textAnchor="end" className="fill-ink-soft text-[12px]">
              {tickText(tick.value)}
            </text>
          </g>
        ))}
        <text x={(box.left + box.width - box.right) / 2} y={box.height - 8} textAnchor="middle" className="fill-ink text-[13px] font-semibold">
          Fill level: height above the cavity floor ({plot.xUnit})
        </text>
        <text
          x={14}
          y={(box.top + bottomY) / 2}
          textAnchor="middle"
          transform={`rotate(-90 14 ${(box.top + bottomY) / 2})`}
          className="fill-ink text-[13px] font-semibold"
        >
          Volume ({plot.yUnit})
        </text>
        <path d={plot.path} fill="none" className="stroke-walnut-800" strokeWidth="2.5" strokeLinejoin="round" />
        {plot.marker ? (
          <g>
            <line x1={plot.marker.x} x2={plot.marker.x} y1={box.top} y2={bottomY} className="stroke-resin-500" strokeWidth="2" />
            <circle cx={plot.marker.x} cy={plot.marker.y} r="6" className="fill-resin-300 stroke-walnut-900" strokeWidth="2" />
          </g>
        ) : null}
      </svg>
      <figcaption id={summaryId} className="text-sm text-ink-soft">
        {summary}
      </figcaption>
      <details className="rounded-lg border border-line bg-white px-3 py-2">
        <summary className="min-h-touch cursor-pointer content-center font-semibold">The curve in numbers</summary>
        <div className="mt-2">
          <Table caption={`Volume at each height, ${damWords[dam]}`}>
            <Thead>
              <tr>
                <Th>Height above the cavity floor</Th>
                <Th className="text-right">Volume below it</Th>
              </tr>
            </Thead>
            <tbody>
              {curveRows(curve, 0).map((row) => (
                <Tr key={row.heightMm}>
                  <Td className="tabular-nums">{formatLength(row.heightMm, unitSystem).text}</Td>
                  <Td className="text-right tabular-nums">{formatVolume(mm3ToMl(row.volumeMm3), unitSystem).text}</Td>
                </Tr>
              ))}
            </tbody>
          </Table>
        </div>
      </details>
    </figure>
  );
}
