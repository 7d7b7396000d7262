import { formatLength, formatVolume, mm3ToMl, type UnitSystem } from '@gelpoint/core';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';
import type { Dam, LayerVolumes } from '../types';
import type { LayerLines } from '../utils/layer-lines';
import { damWords } from './DamChoice';

export interface LayerTableProps {
  lines: LayerLines;
  volumes: LayerVolumes | undefined;
  dam: Dam;
  unitSystem: UnitSystem;
}

/** Each layer between its two lines (heights above the cavity floor), with the resin the stored analysis says it takes. */
export function LayerTable({ lines, volumes, dam, unitSystem }: LayerTableProps) {
  const height = (z: number) => formatLength(z, unitSystem).text;
  return (
    <Table caption={`Layers from the cavity floor, with ${damWords[dam]}`} showCaption>
      <Thead>
        <tr>
          <Th>Layer</Th>
          <Th>From</Th>
          <Th>To</Th>
          <Th className="text-right">Thickness</Th>
          <Th className="text-right">Resin</Th>
        </tr>
      </Thead>
      <tbody>
        {lines.layers.map((layer, i) => {
          const volume = volumes?.dam === dam ? volumes.layers[i]?.volumeMm3 : undefined;
          return (
            <Tr key={layer.index}>
              <Td>{layer.index + 1}</Td>
              <Td className="tabular-nums">{height(layer.fromLevelMm)}</Td>
              <Td className="tabular-nums">{height(layer.toLevelMm)}</Td>
              <Td className="text-right tabular-nums">{formatLength(layer.thicknessMm, unitSystem).text}</Td>
              <Td className="text-right tabular-nums">{volume === undefined ? 'working it out…' : formatVolume(mm3ToMl(volume), unitSystem).text}</Td>
            </Tr>
          );
        })}
      </tbody>
    </Table>
  );
}
