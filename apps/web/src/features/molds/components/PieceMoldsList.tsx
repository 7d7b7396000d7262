import { formatVolume, mm3ToMl, type UnitSystem } from '@gelpoint/core';
import { TextLink } from '../../../components/ui/TextLink';
import { paths } from '../../../config/paths';
import type { MoldSummary } from '../types';
import { MoldStatusBadge } from './MoldStatusBadge';

/** A piece's moulds: each a link to its cavity report, with the state of its analysis and what it holds. */
export function PieceMoldsList({ molds, unitSystem }: { molds: readonly MoldSummary[]; unitSystem: UnitSystem }) {
  return (
    <ul className="flex flex-col divide-y divide-line" aria-label="Moulds of this piece">
      {molds.map((mold) => (
        <li key={mold.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
          <span className="flex flex-col">
            <TextLink to={paths.mould.getHref(mold.id)}>{mold.name}</TextLink>
            <span className="text-sm text-ink-soft">
              {mold.fillVolumeToTopMm3 === null ? mold.fileName : `${formatVolume(mm3ToMl(mold.fillVolumeToTopMm3), unitSystem).text} to the top`}
            </span>
          </span>
          <MoldStatusBadge status={mold.status} />
        </li>
      ))}
    </ul>
  );
}
