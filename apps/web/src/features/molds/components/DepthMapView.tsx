import { formatLength, type UnitSystem } from '@gelpoint/core';
import { useEffect, useId, useRef } from 'react';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';
import type { DepthMap } from '../types';
import { formatArea } from '../utils/area-format';
import { bandIndex, summariseDepthMap } from '../utils/depth-bands';

const dryColour = '#f3ece1';
const markColour = '#21170f';
const maxCanvasWidth = 560;
const maxCanvasHeight = 420;

function canvasSize(map: DepthMap): { width: number; height: number } {
  const spanX = map.nx * map.cellMm[0];
  const spanY = map.ny * map.cellMm[1];
  const scale = Math.min(maxCanvasWidth / spanX, maxCanvasHeight / spanY);
  return { width: Math.max(1, Math.round(spanX * scale)), height: Math.max(1, Math.round(spanY * scale)) };
}

export interface DepthMapViewProps {
  map: DepthMap;
  unitSystem: UnitSystem;
  updating: boolean;
}

/** The resin depth seen from above, in bands of colour that the legend names in numbers; the deepest spot is marked and labelled. */
export function DepthMapView({ map, unitSystem, updating }: DepthMapViewProps) {
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const descriptionId = useId();
  const summary = summariseDepthMap(map);
  const { width, height } = canvasSize(map);

  useEffect(() => {
    const canvas = canvasRef.current;
    const context = canvas?.getContext('2d');
    if (!canvas || !context) return;
    const ratio = window.devicePixelRatio || 1;
    canvas.width = width * ratio;
    canvas.height = height * ratio;
    context.setTransform(ratio, 0, 0, ratio, 0, 0);
    const cellW = width / map.nx;
    const cellH = height / map.ny;
    const current = summariseDepthMap(map);
    for (let iy = 0; iy < map.ny; iy++) {
      for (let ix = 0; ix < map.nx; ix++) {
        const band = bandIndex(map.depthsMm[iy * map.nx + ix] ?? 0, current.edgesMm);
        context.fillStyle = band < 0 ? dryColour : current.bands[band]!.colour;
        // Rows run along +y, which is up on a plan seen from above.
        context.fillRect(ix * cellW, (map.ny - 1 - iy) * cellH, Math.ceil(cellW), Math.ceil(cellH));
      }
    }
    const deepest = current.deepest;
    if (deepest) {
      const cx = (deepest.ix + 0.5) * cellW;
      const cy = (map.ny - 1 - deepest.iy + 0.5) * cellH;
      context.strokeStyle = markColour;
      context.lineWidth = 2.5;
      context.beginPath();
      context.arc(cx, cy, Math.max(6, Math.min(cellW, cellH)), 0, 2 * Math.PI);
      context.stroke();
      const label = `deepest ${formatLength(deepest.depthMm, unitSystem).text}`;
      context.font = '600 14px "Source Sans 3", system-ui, sans-serif';
      const textWidth = context.measureText(label).width;
      const tx = Math.min(Math.max(4, cx + 12), width - textWidth - 8);
      const ty = cy > 24 ? cy - 12 : cy + 24;
      context.fillStyle = 'rgba(255, 255, 255, 0.9)';
      context.fillRect(tx - 4, ty - 14, textWidth + 8, 20);
      context.fillStyle = markColour;
      context.fillText(label, tx, ty);
    }
  }, [map, width, height, unitSystem]);

  const description = summary.deepest
    ? `Resin depth seen from above, ${formatLength(map.nx * map.cellMm[0], unitSystem).text} by ${formatLength(map.ny * map.cellMm[1], unitSystem).text}. The deepest resin, ${formatLength(summary.deepest.depthMm, unitSystem).text}, stands at x ${formatLength(summary.deepest.xMm, unitSystem).text}, y ${formatLength(summary.deepest.yMm, unitSystem).text}; the table gives the share of the footprint in each depth band.`
    : 'No resin stands anywhere at this level.';

  return (
    <figure className="flex flex-col gap-3" aria-busy={updating || undefined}>
      <canvas
        ref={canvasRef}
        role="img"
        aria-label="Resin depth map"
        aria-describedby={descriptionId}
        className="h-auto w-full max-w-xl rounded-lg border border-line"
        width={width}
        height={height}
      />
      <figcaption id={descriptionId} className="text-sm text-ink-soft">
        {description}
      </figcaption>
      {summary.bands.length > 0 ? (
        <Table caption="Depth bands of the map">
          <Thead>
            <tr>
              <Th>Colour</Th>
              <Th>Resin depth</Th>
              <Th className="text-right">Area</Th>
              <Th className="text-right">Share of the footprint</Th>
            </tr>
          </Thead>
          <tbody>
            {summary.bands.map((band) => (
              <Tr key={band.fromMm}>
                <Td>
                  <svg aria-hidden="true" viewBox="0 0 24 16" className="h-4 w-6">
                    <rect width="24" height="16" rx="3" fill={band.colour} stroke={markColour} strokeWidth="0.75" />
                  </svg>
                </Td>
                <Td className="tabular-nums">
                  over {formatLength(band.fromMm, unitSystem).text} to {formatLength(band.toMm, unitSystem).text}
                </Td>
                <Td className="text-right tabular-nums">{formatArea(band.areaMm2, unitSystem).text}</Td>
                <Td className="text-right tabular-nums">{band.sharePct.toFixed(1)} %</Td>
              </Tr>
            ))}
          </tbody>
        </Table>
      ) : null}
    </figure>
  );
}
