import { formatLength, formatVolume, mm3ToMl, type UnitSystem } from '@gelpoint/core';
import type { CavityReport, MoldView } from '../types';
import { fileUnitWords } from '../utils/file-units';

const formatNames: Record<MoldView['format'], string> = { stl: 'STL', '3mf': '3MF', obj: 'OBJ' };

const methodWords: Record<CavityReport['method'], string> = {
  exact: 'Exact, from the mesh’s own faces',
  columns: 'Sampled in vertical columns',
};

/** What was measured and how well: the facts behind every number on the page. */
export function MeshFacts({ mold, report, unitSystem }: { mold: MoldView; report: CavityReport; unitSystem: UnitSystem }) {
  const size = [0, 1, 2].map((k) => formatLength(report.bboxMm.max[k]! - report.bboxMm.min[k]!, unitSystem).text).join(' × ');
  return (
    <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-[14rem_minmax(0,1fr)]">
      <dt className="font-semibold text-ink-soft">Size (width × depth × height)</dt>
      <dd className="tabular-nums">{size}</dd>
      <dt className="font-semibold text-ink-soft">Read as</dt>
      <dd>
        {fileUnitWords[mold.units].plural}
        {mold.fileUnits === null
          ? ''
          : mold.fileUnits === mold.units
            ? ' (as the file states)'
            : ` (the file states ${fileUnitWords[mold.fileUnits].plural})`}, {mold.upAxis.toUpperCase()} up
      </dd>
      <dt className="font-semibold text-ink-soft">Method</dt>
      <dd>
        {methodWords[report.method]}
        {report.resolutionMm !== null ? `, every ${formatLength(report.resolutionMm, unitSystem).text}` : ''}
      </dd>
      <dt className="font-semibold text-ink-soft">Estimated error</dt>
      <dd className="tabular-nums">± {report.estimatedErrorPct.toFixed(2)} % of the volume</dd>
      <dt className="font-semibold text-ink-soft">Triangles</dt>
      <dd className="tabular-nums">{report.triangles.toLocaleString()}</dd>
      <dt className="font-semibold text-ink-soft">Watertight</dt>
      <dd>{report.watertight ? 'Yes, every edge is shared by two faces' : 'No, the mesh has open edges'}</dd>
      {report.enclosedVolumeMm3 !== null ? (
        <>
          <dt className="font-semibold text-ink-soft">Volume of the solid</dt>
          <dd className="tabular-nums">{formatVolume(mm3ToMl(report.enclosedVolumeMm3), unitSystem).text}</dd>
        </>
      ) : null}
      <dt className="font-semibold text-ink-soft">File</dt>
      <dd>
        {mold.fileName}, {formatNames[mold.format]}, {(mold.sizeBytes / 1024).toFixed(1)} KiB
      </dd>
    </dl>
  );
}
