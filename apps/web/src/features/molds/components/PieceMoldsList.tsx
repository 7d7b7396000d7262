import { formatVolume, mm3ToMl, type UnitSystem } from '@gelpoint/core';
import { LinkedList } from '../../../components/ui/LinkedList';
import { paths } from '../../../config/paths';
import type { MoldSummary } from '../types';
import { MoldStatusBadge } from './MoldStatusBadge';

/** A piece's moulds: each a link to its cavity report, with the state of its analysis and what it holds. */
export function PieceMoldsList({ molds, unitSystem }: { molds: readonly MoldSummary[]; unitSystem: UnitSystem }) {
  const rows = molds.map((mold) => ({
    id: mold.id,
    to: paths.mould.getHref(mold.id),
    name: mold.name,
    detail: mold.fillVolumeToTopMm3 === null ? mold.fileName : `${formatVolume(mm3ToMl(mold.fillVolumeToTopMm3), unitSystem).text} to the top`,
    aside: <MoldStatusBadge status={mold.status} />,
  }));
  return <LinkedList label="Moulds of this piece" rows={rows} />;
}
